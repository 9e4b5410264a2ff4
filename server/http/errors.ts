// The API's errors: HttpError and its helpers (404, 429), and the one error middleware that turns
// them, zod issues, bad bodies and a lost database into JSON answers.
import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    readonly extra?: Record<string, unknown>,
    /** Headers the answer carries (Retry-After on a 429), set by the error middleware. */
    readonly headers?: Record<string, string>,
  ) {
    super(message);
  }
}

/** 429 with Retry-After: the caller may try again in `retryAfterS` seconds. */
export const tooManyRequests = (message: string, retryAfterS: number) =>
  new HttpError(429, 'too_many', message, undefined, undefined, { 'Retry-After': String(retryAfterS) });

export const notFound = (what = 'That item') => new HttpError(404, 'not_found', `${what} was not found.`);

/** The value, or a 404 naming `what` ("That room") when the studio has no such record. */
export function orNotFound<T>(value: T | null | undefined, what: string): T {
  if (value === null || value === undefined) throw notFound(what);
  return value;
}

/** Turns zod issues into { "a.b[1].c": "message" }, first message per field. */
export function zodFields(err: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key =
      issue.path.map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? String(p) : `.${String(p)}`)).join('') || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

// The one error middleware: HttpError and ZodError become { error: { code, message, fields } };
// anything else is logged and answered as a bare 500.
export const errorMiddleware: ErrorRequestHandler = (err, req, res, _next) => {
  if (err instanceof HttpError) {
    if (err.headers) res.set(err.headers);
    res.status(err.status).json({ error: { code: err.code, message: err.message, fields: err.fields }, ...err.extra });
    return;
  }
  if (err instanceof ZodError) {
    const fields = zodFields(err);
    const first = Object.values(fields)[0] ?? 'Some fields are not valid.';
    res.status(400).json({ error: { code: 'invalid', message: first, fields } });
    return;
  }
  // Body parser errors (bad JSON, too large) carry a status and a type of their own; files
  // (a missing asset, a path climbing out with "..", a malformed address) only a status.
  const status = typeof err?.status === 'number' && err.status >= 400 && err.status < 500 ? err.status : 500;
  if (status < 500 && typeof err.type === 'string' && BODY_ERRORS[err.type]) {
    res.status(status).json({ error: { code: 'bad_request', message: BODY_ERRORS[err.type] } });
    return;
  }
  if (status < 500) {
    if (req.originalUrl.startsWith('/api/'))
      res.status(404).json({ error: { code: 'not_found', message: 'No such API route.' } });
    else res.status(404).type('text/plain').send('Not found');
    return;
  }
  if (isDatabaseDown(err)) {
    req.log?.warn({ err }, 'database unavailable');
    res.setHeader('Retry-After', String(DATABASE_RETRY_AFTER_S));
    res.status(503).json({ error: { code: 'unavailable', message: 'The database is not answering. Try again in a moment.' } });
    return;
  }
  // The request's own logger carries its id, so the line can be found from the answer's header.
  if (req.log) req.log.error({ err }, 'unhandled error');
  // eslint-disable-next-line no-console -- only an app built without requestLogger gets here
  else console.error('[error]', err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side.' } });
};

/** What body-parser's error types mean to the caller. */
const BODY_ERRORS: Record<string, string> = {
  'entity.parse.failed': 'The request body is not valid JSON.',
  'entity.too.large': 'The request is too large.',
  'entity.verify.failed': 'The request body could not be read.',
  'encoding.unsupported': 'The request body could not be read.',
  'charset.unsupported': 'The request body could not be read.',
  'request.aborted': 'The request body could not be read.',
  'request.size.invalid': 'The request body could not be read.',
  'stream.encoding.set': 'The request body could not be read.',
  'parameters.too.many': 'The request body could not be read.',
};

/** Seconds a client is asked to wait while the database is away: a restart usually takes a few. */
const DATABASE_RETRY_AFTER_S = 5;
// Socket errors, PostgreSQL's "shutting down" / "starting up" / "crash recovery" codes, and the
// driver's own messages when a connection drops mid-query or cannot be made in time.
const DOWN_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
  'ETIMEDOUT',
  'ENOTFOUND',
  'EAI_AGAIN',
  '57P01',
  '57P02',
  '57P03',
  '08000',
  '08001',
  '08003',
  '08006',
]);
const DOWN_MESSAGES =
  /^(Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error|Connection terminated due to connection timeout)/;

function isDatabaseDown(err: unknown): boolean {
  const e = err as { code?: unknown; message?: unknown; errors?: unknown } | null;
  if (!e) return false;
  if (typeof e.code === 'string' && DOWN_CODES.has(e.code)) return true;
  if (typeof e.message === 'string' && DOWN_MESSAGES.test(e.message)) return true;
  // Node reports a refused connection to every address of a host as one AggregateError.
  return Array.isArray(e.errors) && e.errors.some(isDatabaseDown);
}
