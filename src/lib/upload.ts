// Sending one multipart form with progress: fetch cannot report upload progress, so this uses
// XMLHttpRequest, and answers with the server's body or an ApiError carrying its message.
import type { ErrorBody } from '../../shared/schemas/common';
import { ApiError } from './api';

/**
 * Sends `form` to `path` (POST unless told), reporting progress 0…1 as its bytes leave. Resolves
 * with the body when the server answers `okStatus`, else rejects with the server's refusal.
 */
export function sendForm<T>(
  path: string,
  form: FormData,
  opts: { method?: 'POST' | 'PUT'; okStatus?: number; onProgress?: (fraction: number) => void; signal?: AbortSignal } = {},
): Promise<T> {
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
      reject(
        new ApiError(xhr.status, e?.code ?? 'error', e?.message ?? `The server answered ${xhr.status}.`, e?.fields ?? {}, body),
      );
    };
    xhr.onerror = () =>
      reject(new ApiError(0, 'offline', 'Parlour cannot reach the server. Check your connection and try again.'));
    xhr.onabort = () => reject(new DOMException('The upload was stopped.', 'AbortError'));
    opts.signal?.addEventListener('abort', () => xhr.abort());
    xhr.send(form);
  });
}
