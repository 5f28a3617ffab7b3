import { apiPath, apiRoutes, sessionSchema, type ApiPath } from '@holdfast/shared';
import { env } from '../config/env';
import { ApiRequestError } from './api-error';
import { noteServerAnswer } from './server-reach';
import { sessionStore } from './session';

/** Anything with a zod-like `parse`, so responses can be checked against shared schemas. */
export interface Parser<T> {
  parse(data: unknown): T;
}

export type QueryValue = string | number | boolean | null | undefined;
export type QueryParams = Record<string, QueryValue | QueryValue[]>;

export function apiUrl(path: ApiPath, query?: QueryParams): string {
  const url = `${env.apiBase}${path.startsWith('/') ? path : `/${path}`}`;
  if (!query) return url;
  const params = new URLSearchParams();
  for (const [key, raw] of Object.entries(query)) {
    const values = Array.isArray(raw) ? raw : [raw];
    for (const v of values)
      if (v !== undefined && v !== null && v !== '') params.append(key, String(v));
  }
  const qs = params.toString();
  return qs ? `${url}?${qs}` : url;
}

let refreshing: Promise<boolean> | null = null;

/**
 * Ask for a new access token with the httpOnly refresh cookie. Concurrent callers share one
 * request, because the server rotates the refresh token and a second use would be refused.
 */
export function refreshSession(): Promise<boolean> {
  refreshing ??= (async () => {
    try {
      const res = await fetch(apiUrl(apiPath(apiRoutes.auth.refresh)), {
        method: 'POST',
        credentials: 'same-origin',
        headers: { Accept: 'application/json' },
      });
      noteServerAnswer(true);
      if (!res.ok) return false;
      sessionStore.start(sessionSchema.parse(await res.json()));
      return true;
    } catch (error) {
      // No answer (a TypeError from fetch), as opposed to an answer that could not be read.
      if (error instanceof TypeError) noteServerAnswer(false);
      return false;
    } finally {
      refreshing = null;
    }
  })();
  return refreshing;
}

function authHeaders(auth: boolean): Record<string, string> {
  const token = auth ? sessionStore.getAccessToken() : null;
  return token ? { Authorization: `Bearer ${token}` } : {};
}

export async function readBody(res: Response): Promise<unknown> {
  if (res.status === 204) return undefined;
  const text = await res.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

/**
 * Run `send` with the current token. On 401: if another call already renewed the token, retry
 * with it; otherwise refresh once and retry; if that fails, end the session.
 */
export async function withAuthRetry<R extends { status: number }>(
  auth: boolean,
  send: (headers: Record<string, string>) => Promise<R>,
): Promise<R> {
  const tokenUsed = sessionStore.getAccessToken();
  const first = await send(authHeaders(auth));
  if (first.status !== 401 || !auth) return first;
  const current = sessionStore.getAccessToken();
  const renewed = (current !== null && current !== tokenUsed) || (await refreshSession());
  if (!renewed) {
    // Only a refused token means a session ended; a call sent with none (a first visit straight to
    // a deep link) found no session to end, and the sign-in page should not say one expired.
    sessionStore.end(tokenUsed === null ? 'signed-out' : 'expired');
    return first;
  }
  const second = await send(authHeaders(auth));
  if (second.status === 401) sessionStore.end('expired');
  return second;
}

export async function sendFetch(url: string, init: RequestInit): Promise<Response> {
  try {
    const res = await fetch(url, init);
    noteServerAnswer(true);
    return res;
  } catch (error) {
    if (init.signal?.aborted) throw error;
    noteServerAnswer(false);
    throw ApiRequestError.network(error);
  }
}
