import type { ApiPath } from '@holdfast/shared';
import { ApiRequestError } from './api-error';
import { apiUrl, withAuthRetry, type Parser } from './api-core';

export interface UploadProgress {
  loaded: number;
  total: number;
  /** 0–100, or null while the size is unknown. */
  percent: number | null;
}

export interface UploadOptions<T> {
  method?: 'POST' | 'PUT';
  schema?: Parser<T>;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
}

interface XhrResult {
  status: number;
  body: unknown;
}

function send(
  url: string,
  method: string,
  form: FormData,
  headers: Record<string, string>,
  onProgress: UploadOptions<unknown>['onProgress'],
  signal: AbortSignal | undefined,
): Promise<XhrResult> {
  // fetch cannot report upload progress, so multipart uploads go through XMLHttpRequest.
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(method, url);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    for (const [k, v] of Object.entries(headers)) xhr.setRequestHeader(k, v);
    xhr.upload.onprogress = (e) =>
      onProgress?.({
        loaded: e.loaded,
        total: e.total,
        percent: e.lengthComputable && e.total > 0 ? Math.round((e.loaded / e.total) * 100) : null,
      });
    xhr.onload = () => {
      let body: unknown = xhr.responseText;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : undefined;
      } catch {
        /* keep the text */
      }
      resolve({ status: xhr.status, body });
    };
    xhr.onerror = () => reject(ApiRequestError.network());
    xhr.onabort = () => reject(new DOMException('Upload cancelled', 'AbortError'));
    if (signal) {
      if (signal.aborted) return xhr.abort();
      signal.addEventListener('abort', () => xhr.abort(), { once: true });
    }
    xhr.send(form);
  });
}

/** Multipart upload with progress, the same token handling and error envelope as apiRequest. */
export async function apiUpload<T = unknown>(
  path: ApiPath<'POST'>,
  form: FormData,
  options: UploadOptions<T> = {},
): Promise<T> {
  const { method = 'POST', schema, onProgress, signal } = options;
  const url = apiUrl(path);
  const res = await withAuthRetry(true, (headers) =>
    send(url, method, form, headers, onProgress, signal),
  );
  if (res.status < 200 || res.status >= 300) throw ApiRequestError.fromBody(res.status, res.body);
  return schema ? schema.parse(res.body) : (res.body as T);
}
