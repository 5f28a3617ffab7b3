import type { ApiPath, HttpMethod, Session } from '@holdfast/shared';
import { ApiRequestError } from './api-error';
import {
  apiUrl,
  readBody,
  refreshSession,
  sendFetch,
  withAuthRetry,
  type Parser,
  type QueryParams,
} from './api-core';
import { sessionStore } from './session';

export { ApiRequestError, isApiRequestError, errorMessage } from './api-error';
export { apiUrl, refreshSession, type Parser, type QueryParams, type QueryValue } from './api-core';
export { apiUpload, type UploadProgress, type UploadOptions } from './api-upload';
export { apiDownload, saveBlob, type Download } from './api-download';

/** On page load: sign back in from the refresh cookie if there is one. */
export async function restoreSession(): Promise<void> {
  const ok = await refreshSession();
  if (!ok && sessionStore.getState().status !== 'signed-in') sessionStore.end('signed-out');
}

/** Replace the session after a successful sign-in. */
export function startSession(session: Session): void {
  sessionStore.start(session);
}

export interface RequestOptions<T> {
  method?: HttpMethod;
  /** JSON-serialisable body, or FormData (sent as multipart). */
  body?: unknown;
  query?: QueryParams;
  schema?: Parser<T>;
  signal?: AbortSignal;
  headers?: Record<string, string>;
  /** Send the access token and refresh on 401. Off for the auth endpoints themselves. */
  auth?: boolean;
}

/** One JSON (or multipart) API call; throws ApiRequestError for any failure. */
export async function apiRequest<T = unknown>(
  path: ApiPath,
  options: RequestOptions<T> = {},
): Promise<T> {
  const { method = 'GET', body, query, schema, signal, headers = {}, auth = true } = options;
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  const url = apiUrl(path, query);
  const res = await withAuthRetry(auth, (authH) =>
    sendFetch(url, {
      method,
      signal,
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json',
        ...(body !== undefined && !isForm ? { 'Content-Type': 'application/json' } : {}),
        ...authH,
        ...headers,
      },
      body: body === undefined ? undefined : isForm ? (body as FormData) : JSON.stringify(body),
    }),
  );
  const data = await readBody(res);
  if (!res.ok) throw ApiRequestError.fromBody(res.status, data);
  return schema ? schema.parse(data) : (data as T);
}

/** A call of one HTTP method: only a path built by `apiPath` from a route of that method fits. */
type Verb<M extends HttpMethod> = <T = unknown>(
  path: ApiPath<M>,
  options?: Omit<RequestOptions<T>, 'method'>,
) => Promise<T>;
const verb =
  <M extends HttpMethod>(method: M): Verb<M> =>
  (path, options) =>
    apiRequest(path, { ...options, method });

export const api = {
  get: verb('GET'),
  post: verb('POST'),
  put: verb('PUT'),
  patch: verb('PATCH'),
  delete: verb('DELETE'),
};
