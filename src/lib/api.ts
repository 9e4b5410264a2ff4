// The one fetch wrapper: JSON in and out, errors as ApiError with the server's field messages.
import type { ErrorBody } from '../../shared/schemas/common';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
    readonly body: unknown = null,
  ) {
    super(message);
  }
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export async function api<T>(path: string, opts: { method?: Method; body?: unknown; signal?: AbortSignal } = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(path, {
      method: opts.method ?? 'GET',
      credentials: 'same-origin',
      headers:
        opts.body === undefined
          ? { accept: 'application/json' }
          : { 'content-type': 'application/json', accept: 'application/json' },
      body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
      signal: opts.signal,
    });
  } catch (err) {
    if ((err as Error).name === 'AbortError') throw err;
    throw new ApiError(0, 'offline', 'Parlour cannot reach the server. Check your connection and try again.');
  }
  if (res.status === 204) return undefined as T;
  const body: unknown = await res.json().catch(() => null);
  if (!res.ok) {
    const e = (body as ErrorBody | null)?.error;
    throw new ApiError(res.status, e?.code ?? 'error', e?.message ?? `The server answered ${res.status}.`, e?.fields ?? {}, body);
  }
  return body as T;
}

/** The message for one field, or the general message when the error names no fields. */
export function fieldError(err: unknown, field: string): string | undefined {
  return err instanceof ApiError ? err.fields[field] : undefined;
}

export function errorMessage(err: unknown): string {
  return err instanceof Error ? err.message : 'Something went wrong.';
}

/**
 * Waits for a save and answers as a committed field expects: null when it was saved, otherwise
 * the reason, the field's own message first.
 */
export async function commitAnswer(save: Promise<unknown>, field: string): Promise<string | null> {
  try {
    await save;
    return null;
  } catch (err) {
    return fieldError(err, field) ?? errorMessage(err);
  }
}
