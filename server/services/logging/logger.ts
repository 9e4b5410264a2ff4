// Structured logs: one JSON line per event (pino), one line per answered request (requestLogger below), each
// request's lines carrying its id. Secrets never reach a line: headers are left out entirely,
// token-bearing paths are masked, and fields that could hold a password or token are censored.
import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { pino, type DestinationStream, type Level, type Logger } from 'pino';
import type { RequestHandler } from 'express';

export type { Logger } from 'pino';
export type LogLevel = Level | 'silent';

export const REQUEST_ID_HEADER = 'x-request-id';
/** An incoming id is kept only when it is short and plain, so a caller cannot forge log structure. */
const INCOMING_ID = /^[A-Za-z0-9._:-]{1,100}$/;
export const REDACTED = '[redacted]';

// Field names that can carry a secret anywhere in a logged object (bodies are never logged, but
// an error or a future log call might include one).
const SECRET_FIELDS = [
  'password',
  'currentPassword',
  'newPassword',
  'token',
  'link',
  'cookie',
  'authorization',
  'presentationKey',
];
const REDACT_PATHS = [
  ...SECRET_FIELDS,
  ...SECRET_FIELDS.map((f) => `*.${f}`),
  ...SECRET_FIELDS.map((f) => `*.*.${f}`),
  'req.headers',
  'res.headers',
  'headers',
];

// Paths whose segment after the prefix is a bearer secret: the client's presentation link (page
// and API) and the invitation link (page and API).
const TOKEN_IN_PATH = /(\/(?:api\/)?(?:p|invites?)\/)[^/?#]+/g;
// Anything shaped like a JWT, wherever it appears in a string.
const JWT_LIKE = /eyJ[A-Za-z0-9_-]{4,}\.[A-Za-z0-9_-]{4,}\.[A-Za-z0-9_-]{4,}/g;

/** A URL or text with every token it could carry masked. */
export function redactText(text: string): string {
  return text.replace(TOKEN_IN_PATH, `$1${REDACTED}`).replace(JWT_LIKE, REDACTED);
}

export interface LoggerOptions {
  level: LogLevel;
  /** Where lines go; stdout when not given. Tests pass a stream to read them back. */
  destination?: DestinationStream;
}

/**
 * Lines go to stdout in batches of about 4 KB (a dozen request lines) rather than one write each,
 * and at least once a second however quiet it is: a busy link's answers no longer pay a write
 * apiece (npm run bench:load: 0.75 of a bare server with a write per line, 0.92 batched, 0.91 with
 * no logging at all). Shutdown flushes what is left (server/index.ts).
 */
const STDOUT_BATCH_BYTES = 4096;
const STDOUT_FLUSH_MS = 1000;

export function createLogger(opts: LoggerOptions): Logger {
  return pino(
    {
      level: opts.level,
      base: { service: 'parlour' },
      redact: { paths: REDACT_PATHS, censor: REDACTED },
      serializers: {
        err: (err: Error) => {
          const out = pino.stdSerializers.err(err);
          return { ...out, message: redactText(out.message), stack: out.stack ? redactText(out.stack) : undefined };
        },
      },
    },
    opts.destination ?? pino.destination({ fd: 1, sync: false, minLength: STDOUT_BATCH_BYTES, periodicFlush: STDOUT_FLUSH_MS }),
  );
}

declare module 'http' {
  interface IncomingMessage {
    /** The request's id (see requestLogger). */
    id: string;
    /** The request's logger: every line carries its id. Made on first use. */
    log: Logger;
  }
}

/** What a closing line says about the request; nothing else of it is logged. */
function requestFields(req: IncomingMessage) {
  return { id: req.id, method: req.method, url: redactText(req.url ?? ''), remoteAddress: req.socket?.remoteAddress };
}

/**
 * Logs each request once it is answered (or its connection closes first), under a request id:
 * the caller's `x-request-id` when it is plain, else a fresh UUID, echoed in the response either
 * way. The line is `{ reqId, req: { id, method, url, remoteAddress }, res: { statusCode },
 * responseTime, msg: 'request completed' }`, at warn for 4xx and error (with `err`, "request
 * errored") for 5xx. The request's own logger (`req.log`, with `reqId`) is only made when a
 * handler logs. A closing line without an error holds only the fields built here, the URL already
 * masked, so it skips the redaction walk every other line takes (about ten times the cost of the
 * line itself, measured on a busy link).
 */
export function requestLogger(logger: Logger): RequestHandler {
  const begin = requestLogBeginner(logger);
  return (req, res, next) => {
    res.setHeader(REQUEST_ID_HEADER, begin(req, res));
    next();
  };
}

/**
 * What requestLogger does for each request, as a function for a route answered before it (the
 * client link's ready answer): gives the request its id and its closing line, and returns the id
 * for the caller to echo in `x-request-id`.
 */
export function requestLogBeginner(logger: Logger): (req: IncomingMessage, res: ServerResponse) => string {
  const closing = logger.child({}, { redact: { paths: [] } });
  return (req, res) => {
    const incoming = req.headers[REQUEST_ID_HEADER];
    const id = typeof incoming === 'string' && INCOMING_ID.test(incoming) ? incoming : randomUUID();
    req.id = id;
    lazyLogOn(Object.getPrototypeOf(req) as object);
    const state: RequestLogState = { logger, closing, req, started: Date.now(), logged: false, own: undefined };
    (req as unknown as Logged)[STATE] = state;
    (res as unknown as Logged)[STATE] = state;
    // One shared listener for both events (no closures per request); whichever comes first logs.
    res.on('finish', answered);
    res.on('close', answered);
    return id;
  };
}

const STATE = Symbol('request log');
interface RequestLogState {
  logger: Logger;
  closing: Logger;
  req: IncomingMessage;
  started: number;
  logged: boolean;
  /** The request's own logger, once a handler asked for it. */
  own: Logger | undefined;
}
interface Logged {
  [STATE]?: RequestLogState;
}

function answered(this: ServerResponse, err?: Error): void {
  const state = (this as unknown as Logged)[STATE];
  if (!state || state.logged) return;
  state.logged = true;
  const status = this.statusCode;
  const failed = err ?? (status >= 500 ? new Error(`failed with status code ${status}`) : undefined);
  const level: Level = failed ? 'error' : status >= 400 ? 'warn' : 'info';
  if (!state.logger.isLevelEnabled(level)) return;
  const line = {
    reqId: state.req.id,
    req: requestFields(state.req),
    res: { statusCode: status },
    responseTime: Date.now() - state.started,
  };
  if (failed) state.logger[level]({ ...line, err: failed }, 'request errored');
  else state.closing[level](line, 'request completed');
}

const withLazyLog = new WeakSet<object>();
/**
 * Gives requests of this prototype (each Express app has its own) a `log` made on first read from
 * the request's own state, so a request whose handler never logs never builds a child logger.
 */
function lazyLogOn(proto: object): void {
  if (withLazyLog.has(proto)) return;
  withLazyLog.add(proto);
  Object.defineProperty(proto, 'log', {
    configurable: true,
    enumerable: false,
    get(this: Logged) {
      const state = this[STATE];
      if (!state) return undefined;
      return (state.own ??= state.logger.child({ reqId: state.req.id }));
    },
    set(this: Logged, l: Logger) {
      const state = this[STATE];
      if (state) state.own = l;
      else Object.defineProperty(this, 'log', { value: l, writable: true, configurable: true });
    },
  });
}
