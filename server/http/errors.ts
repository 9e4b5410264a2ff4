import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const notFound = (what = 'That item') => new HttpError(404, 'not_found', `${what} was not found.`);

/** Turns zod issues into { "a.b[1].c": "message" }, first message per field. */
export function zodFields(err: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = issue.path
      .map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? String(p) : `.${String(p)}`))
      .join('') || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

// The one error middleware: HttpError and ZodError become { error: { code, message, fields } };
// anything else is logged and answered as a bare 500.
export const errorMiddleware: ErrorRequestHandler = (err, _req, res, _next) => {
  if (err instanceof HttpError) {
    res.status(err.status).json({ error: { code: err.code, message: err.message, fields: err.fields }, ...err.extra });
    return;
  }
  if (err instanceof ZodError) {
    const fields = zodFields(err);
    const first = Object.values(fields)[0] ?? 'Some fields are not valid.';
    res.status(400).json({ error: { code: 'invalid', message: first, fields } });
    return;
  }
  // Body parser errors (bad JSON, too large) carry a status of their own.
  const status = typeof err?.status === 'number' && err.status >= 400 && err.status < 500 ? err.status : 500;
  if (status < 500) {
    const message = err.type === 'entity.too.large' ? 'The request is too large.' : 'The request body is not valid JSON.';
    res.status(status).json({ error: { code: 'bad_request', message } });
    return;
  }
  if (isDatabaseDown(err)) {
    res.status(503).json({ error: { code: 'unavailable', message: 'The database is not answering. Try again in a moment.' } });
    return;
  }
  console.error('[error]', err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side.' } });
};

function isDatabaseDown(err: unknown): boolean {
  const code = (err as { code?: string })?.code;
  return code === 'ECONNREFUSED' || code === '57P01' || code === '57P03' || code === 'ECONNRESET';
}
