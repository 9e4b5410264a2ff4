// Sending one multipart form with progress: fetch cannot report upload progress, so this uses
// XMLHttpRequest, and answers with the server's body or an ApiError carrying its message. When the
// server is holding as many uploads as it has memory for (503 uploads_busy, with Retry-After), the
// form is sent again after the wait it asks for, a few times, before the refusal is shown.
import type { ErrorBody } from '../../shared/schemas/common';
import { ApiError } from './api';

type SendOptions = {
  method?: 'POST' | 'PUT';
  okStatus?: number;
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
};

/** Tries after a busy answer, and the longest wait between them (seconds). */
const BUSY_TRIES = 5;
const BUSY_WAIT_MAX_S = 30;

/**
 * Sends `form` to `path` (POST unless told), reporting progress 0…1 as its bytes leave. Resolves
 * with the body when the server answers `okStatus`, else rejects with the server's refusal.
 */
export async function sendForm<T>(path: string, form: FormData, opts: SendOptions = {}): Promise<T> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await sendOnce<T>(path, form, opts);
    } catch (err) {
      if (!(err instanceof BusyError) || attempt >= BUSY_TRIES) throw err instanceof BusyError ? err.refusal : err;
      opts.onProgress?.(0);
      await waitFor(Math.min(err.retryAfterS, BUSY_WAIT_MAX_S) * 1000, opts.signal);
    }
  }
}

class BusyError extends Error {
  constructor(
    readonly refusal: ApiError,
    readonly retryAfterS: number,
  ) {
    super(refusal.message);
  }
}

function waitFor(ms: number, signal?: AbortSignal): Promise<void> {
  return new Promise((resolve, reject) => {
    if (signal?.aborted) return reject(new DOMException('The upload was stopped.', 'AbortError'));
    const timer = setTimeout(resolve, ms);
    signal?.addEventListener('abort', () => {
      clearTimeout(timer);
      reject(new DOMException('The upload was stopped.', 'AbortError'));
    });
  });
}

function sendOnce<T>(path: string, form: FormData, opts: SendOptions): Promise<T> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(opts.method ?? 'POST', path);
    xhr.responseType = 'json';
    xhr.setRequestHeader('accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) opts.onProgress?.(e.loaded / e.total);
    };
    xhr.onload = () => {
      const body = xhr.response as T & Partial<ErrorBody>;
      if (xhr.status === (opts.okStatus ?? 200) && body) return resolve(body);
      const e = body?.error;
      const refusal = new ApiError(
        xhr.status,
        e?.code ?? 'error',
        e?.message ?? `The server answered ${xhr.status}.`,
        e?.fields ?? {},
        body,
      );
      const retryAfterS = Number(xhr.getResponseHeader('retry-after'));
      if (xhr.status === 503 && e?.code === 'uploads_busy' && retryAfterS > 0) reject(new BusyError(refusal, retryAfterS));
      else reject(refusal);
    };
    xhr.onerror = () =>
      reject(new ApiError(0, 'offline', 'Parlour cannot reach the server. Check your connection and try again.'));
    xhr.onabort = () => reject(new DOMException('The upload was stopped.', 'AbortError'));
    opts.signal?.addEventListener('abort', () => xhr.abort());
    xhr.send(form);
  });
}
