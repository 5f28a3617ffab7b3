import type { ApiPath } from '@holdfast/shared';
import { ApiRequestError } from './api-error';
import { apiUrl, readBody, withAuthRetry, type QueryParams } from './api-core';

export interface Download {
  blob: Blob;
  fileName: string | null;
  contentType: string | null;
}

/** Pull the file name out of a Content-Disposition header (RFC 6266, with the UTF-8 form first). */
export function fileNameFromDisposition(header: string | null): string | null {
  if (!header) return null;
  const star = /filename\*\s*=\s*(?:UTF-8|utf-8)''([^;]+)/.exec(header);
  if (star?.[1]) {
    try {
      return decodeURIComponent(star[1].trim());
    } catch {
      /* fall through to the plain form */
    }
  }
  const plain = /filename\s*=\s*"?([^";]+)"?/.exec(header);
  return plain?.[1]?.trim() ?? null;
}

/** Fetch a file (PDF, attachment) with the access token, as a Blob; a `body` makes it a POST. */
export async function apiDownload(
  path: ApiPath<'GET'> | ApiPath<'POST'>,
  options: { query?: QueryParams; signal?: AbortSignal; body?: unknown } = {},
): Promise<Download> {
  const post = options.body !== undefined;
  const url = apiUrl(path, options.query);
  const res = await withAuthRetry(true, async (headers) => {
    try {
      return await fetch(url, {
        method: post ? 'POST' : 'GET',
        headers: post ? { ...headers, 'Content-Type': 'application/json' } : headers,
        body: post ? JSON.stringify(options.body) : undefined,
        signal: options.signal,
        credentials: 'same-origin',
      });
    } catch (error) {
      if (options.signal?.aborted) throw error;
      throw ApiRequestError.network(error);
    }
  });
  if (!res.ok) throw ApiRequestError.fromBody(res.status, await readBody(res));
  return {
    blob: await res.blob(),
    fileName: fileNameFromDisposition(res.headers.get('Content-Disposition')),
    contentType: res.headers.get('Content-Type'),
  };
}

/** Hand a Blob to the browser as a download. */
export function saveBlob(blob: Blob, fileName: string): void {
  const href = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = href;
  a.download = fileName;
  document.body.append(a);
  a.click();
  a.remove();
  // Give the browser a moment to start the download before the URL goes away.
  setTimeout(() => URL.revokeObjectURL(href), 10_000);
}
