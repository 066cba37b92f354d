import { apiErrorFrom, csrfTokenForRequest, resetCsrfToken } from './api-client';

/** 0–1 of the request body sent so far. */
export type UploadProgress = (fraction: number) => void;

function send<T>(
  path: string,
  body: string,
  token: string,
  onProgress: UploadProgress | undefined,
  signal?: AbortSignal,
): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Content-Type', 'application/json');
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader('X-CSRF-Token', token);
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && onProgress) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress?.(1);
        resolve((xhr.responseText ? JSON.parse(xhr.responseText) : undefined) as T);
      } else reject(apiErrorFrom(xhr.status, xhr.responseText, xhr.getResponseHeader('Retry-After')));
    };
    xhr.onerror = () => reject(new TypeError('The connection dropped. Check your signal and try again.'));
    xhr.onabort = () => reject(new DOMException('Stopped', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(body);
  });
}

/**
 * POSTs JSON like `api.post`, but through XMLHttpRequest so a large body (a CSV file) can report how much of it
 * has been sent; fetch cannot report upload progress.
 */
export async function postJsonWithProgress<T>(
  path: string,
  body: unknown,
  onProgress?: UploadProgress,
  signal?: AbortSignal,
): Promise<T> {
  const text = JSON.stringify(body);
  try {
    return await send<T>(path, text, await csrfTokenForRequest(), onProgress, signal);
  } catch (error) {
    // The token may belong to an older session: fetch a fresh one and try once more, as `request` does.
    if (!(error instanceof Error && 'code' in error && error.code === 'csrf_invalid')) throw error;
    resetCsrfToken();
    return send<T>(path, text, await csrfTokenForRequest(), onProgress, signal);
  }
}
