// Structured logs: one JSON line per event (pino), one line per answered request (pino-http), each
// request's lines carrying its id. Secrets never reach a line: headers are left out entirely,
// token-bearing paths are masked, and fields that could hold a password or token are censored.
import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { pino, type DestinationStream, type Level, type Logger } from 'pino';
import { pinoHttp } from 'pino-http';
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
    opts.destination ?? pino.destination({ fd: 1, sync: false }),
  );
}

interface SerializedReq {
  id: unknown;
  method: string;
  url: string;
  remoteAddress?: string;
}
interface SerializedRes {
  statusCode: number;
}

/**
 * Logs each request once it is answered, under a request id: the caller's `x-request-id` when it
 * is plain, else a fresh UUID, echoed in the response either way.
 */
export function requestLogger(logger: Logger): RequestHandler {
  const middleware = pinoHttp<IncomingMessage, ServerResponse>({
    logger,
    // Lines logged while handling a request carry just its id; the closing line adds the request.
    quietReqLogger: true,
    genReqId(req, res) {
      const incoming = req.headers[REQUEST_ID_HEADER];
      const id = typeof incoming === 'string' && INCOMING_ID.test(incoming) ? incoming : randomUUID();
      res.setHeader(REQUEST_ID_HEADER, id);
      return id;
    },
    customLogLevel(_req, res, err) {
      if (err || res.statusCode >= 500) return 'error';
      return res.statusCode >= 400 ? 'warn' : 'info';
    },
    serializers: {
      req: (req: SerializedReq) => ({
        id: req.id,
        method: req.method,
        url: redactText(req.url),
        remoteAddress: req.remoteAddress,
      }),
      res: (res: SerializedRes) => ({ statusCode: res.statusCode }),
    },
  });
  return (req, res, next) => middleware(req, res, next);
}
