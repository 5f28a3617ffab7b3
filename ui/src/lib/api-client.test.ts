import type { ApiPath } from '@holdfast/shared';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { userSchema } from '@holdfast/shared';
import { makeSession, testUsers } from '../testing/fixtures';
import { jsonError, mockFetch } from '../testing/mock-fetch';
import { api, ApiRequestError, apiUrl, restoreSession } from './api-client';
import { fileNameFromDisposition } from './api-download';
import { sessionStore } from './session';

/** A path for a mocked endpoint (product code builds paths with apiPath). */
const testPath = (p: string) => p as ApiPath<never>;

beforeEach(() =>
  sessionStore.reset({ status: 'signed-in', user: testUsers.engineer }, 'old-token'),
);
afterEach(() => sessionStore.reset());

describe('api client', () => {
  it('sends the access token and parses the answer with the schema', async () => {
    const mock = mockFetch({ 'GET /api/auth/me': { body: testUsers.engineer } });
    const me = await api.get(testPath('/auth/me'), { schema: userSchema });
    expect(me.displayName).toBe('Erin Vale');
    expect(mock.calls[0]?.headers.get('Authorization')).toBe('Bearer old-token');
  });

  it('on 401 refreshes once and retries with the new token', async () => {
    const mock = mockFetch({
      'GET /api/sheets': (req) =>
        req.headers.get('Authorization') === 'Bearer new-token'
          ? { body: { items: [] } }
          : jsonError(401, 'unauthenticated', 'expired'),
      'POST /api/auth/refresh': { body: makeSession(testUsers.engineer, 'new-token') },
    });
    await expect(api.get(testPath('/sheets'))).resolves.toEqual({ items: [] });
    expect(mock.callsTo('POST /api/auth/refresh')).toHaveLength(1);
    expect(mock.callsTo('GET /api/sheets')).toHaveLength(2);
    expect(sessionStore.getAccessToken()).toBe('new-token');
  });

  it('shares one refresh between calls that fail together', async () => {
    const mock = mockFetch({
      'GET /api/a': (req) =>
        req.headers.get('Authorization') === 'Bearer new-token'
          ? { body: 'a' }
          : jsonError(401, 'unauthenticated', 'expired'),
      'GET /api/b': (req) =>
        req.headers.get('Authorization') === 'Bearer new-token'
          ? { body: 'b' }
          : jsonError(401, 'unauthenticated', 'expired'),
      'POST /api/auth/refresh': async () => {
        await new Promise((r) => setTimeout(r, 20));
        return { body: makeSession(testUsers.engineer, 'new-token') };
      },
    });
    await expect(Promise.all([api.get(testPath('/a')), api.get(testPath('/b'))])).resolves.toEqual([
      'a',
      'b',
    ]);
    expect(mock.callsTo('POST /api/auth/refresh')).toHaveLength(1);
  });

  it('ends the session when the refresh is refused', async () => {
    mockFetch({
      'GET /api/sheets': jsonError(401, 'unauthenticated', 'expired'),
      'POST /api/auth/refresh': jsonError(401, 'unauthenticated', 'no refresh token'),
    });
    const error = await api.get(testPath('/sheets')).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiRequestError);
    expect((error as ApiRequestError).status).toBe(401);
    expect(sessionStore.getState()).toMatchObject({ status: 'signed-out', endReason: 'expired' });
    expect(sessionStore.getAccessToken()).toBeNull();
  });

  it('does not call a first visit without a session an expired one', async () => {
    sessionStore.reset({ status: 'restoring' }, null);
    mockFetch({
      'GET /api/sheets': jsonError(401, 'unauthenticated', 'no token'),
      'POST /api/auth/refresh': jsonError(401, 'unauthenticated', 'no refresh token'),
    });
    await api.get(testPath('/sheets')).catch(() => undefined);
    expect(sessionStore.getState()).toMatchObject({
      status: 'signed-out',
      endReason: 'signed-out',
    });
  });

  it('turns the error envelope into a typed error with field paths', async () => {
    mockFetch({
      'POST /api/users': jsonError(400, 'validation_failed', 'The request has errors', [
        { path: 'initials', message: '2 to 4 capital letters' },
        { path: 'email', message: 'not a valid e-mail address' },
      ]),
    });
    const error = (await api
      .post(testPath('/users'), { body: {} })
      .catch((e: unknown) => e)) as ApiRequestError;
    expect(error.code).toBe('validation_failed');
    expect(error.message).toBe('The request has errors');
    expect(error.fieldErrors()).toEqual({
      initials: '2 to 4 capital letters',
      email: 'not a valid e-mail address',
    });
  });

  it('gives a plain message for bodies that are not the envelope, and for network failure', async () => {
    mockFetch({ 'GET /api/x': { status: 502, body: '<html>Bad gateway</html>' } });
    const e502 = (await api.get(testPath('/x')).catch((e: unknown) => e)) as ApiRequestError;
    expect(e502).toMatchObject({ status: 502, code: 'internal_error' });

    const { fn } = mockFetch({});
    fn.mockRejectedValueOnce(new TypeError('Failed to fetch'));
    const eNet = (await api.get(testPath('/x')).catch((e: unknown) => e)) as ApiRequestError;
    expect(eNet).toMatchObject({ status: 0, code: 'network_error' });
    expect(eNet.message).toMatch(/cannot reach/i);
  });

  it('restores a session from the refresh cookie, or settles signed out', async () => {
    sessionStore.reset();
    mockFetch({ 'POST /api/auth/refresh': { body: makeSession(testUsers.admin, 'r1') } });
    await restoreSession();
    expect(sessionStore.getState()).toMatchObject({ status: 'signed-in', user: { role: 'admin' } });

    sessionStore.reset();
    mockFetch({ 'POST /api/auth/refresh': jsonError(401, 'unauthenticated', 'none') });
    await restoreSession();
    expect(sessionStore.getState().status).toBe('signed-out');
  });

  it('builds query strings without empty values', () => {
    expect(
      apiUrl(testPath('/sheets'), { q: 'hoist', page: 2, state: ['draft', 'approved'], site: '' }),
    ).toBe('/api/sheets?q=hoist&page=2&state=draft&state=approved');
  });

  it('reads file names from Content-Disposition', () => {
    expect(fileNameFromDisposition('attachment; filename="sheet-12.pdf"')).toBe('sheet-12.pdf');
    expect(fileNameFromDisposition("attachment; filename*=UTF-8''Bremse%20%C3%A4.pdf")).toBe(
      'Bremse ä.pdf',
    );
    expect(fileNameFromDisposition(null)).toBeNull();
  });
});
