import type { ApiPath } from '@holdfast/shared';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { makeSession, testUsers } from '../testing/fixtures';
import { mockFetch } from '../testing/mock-fetch';
import { apiUpload, type UploadProgress } from './api-upload';
import { ApiRequestError } from './api-error';
import { sessionStore } from './session';

/** A path for a mocked endpoint (product code builds paths with apiPath). */
const testPath = (p: string) => p as ApiPath<never>;

interface Sent {
  method: string;
  url: string;
  headers: Record<string, string>;
}

/** A scripted XMLHttpRequest: each send answers with the next reply, after one progress event. */
function fakeXhr(replies: { status: number; body: unknown }[]) {
  const sent: Sent[] = [];
  class FakeXhr {
    status = 0;
    responseText = '';
    withCredentials = false;
    upload: { onprogress: ((e: ProgressEvent) => void) | null } = { onprogress: null };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    onabort: (() => void) | null = null;
    private req: Sent = { method: '', url: '', headers: {} };
    open(method: string, url: string) {
      this.req = { method, url, headers: {} };
    }
    setRequestHeader(k: string, v: string) {
      this.req.headers[k] = v;
    }
    abort() {
      this.onabort?.();
    }
    send() {
      sent.push(this.req);
      const reply = replies.shift() ?? { status: 500, body: {} };
      queueMicrotask(() => {
        this.upload.onprogress?.({
          lengthComputable: true,
          loaded: 50,
          total: 200,
        } as ProgressEvent);
        this.status = reply.status;
        this.responseText = JSON.stringify(reply.body);
        this.onload?.();
      });
    }
  }
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
  return sent;
}

beforeEach(() =>
  sessionStore.reset({ status: 'signed-in', user: testUsers.engineer }, 'old-token'),
);
afterEach(() => sessionStore.reset());

describe('apiUpload', () => {
  it('sends multipart with the token and reports progress', async () => {
    const sent = fakeXhr([{ status: 201, body: { id: 'a1' } }]);
    const progress: UploadProgress[] = [];
    const form = new FormData();
    form.append('file', new Blob(['x']), 'x.txt');
    const result = await apiUpload(testPath('/revisions/r1/attachments'), form, {
      onProgress: (p) => progress.push(p),
    });
    expect(result).toEqual({ id: 'a1' });
    expect(sent[0]).toMatchObject({
      method: 'POST',
      url: '/api/revisions/r1/attachments',
      headers: { Authorization: 'Bearer old-token' },
    });
    expect(progress).toEqual([{ loaded: 50, total: 200, percent: 25 }]);
  });

  it('refreshes on 401 and sends again with the new token', async () => {
    const sent = fakeXhr([
      { status: 401, body: { error: { code: 'unauthenticated', message: 'expired' } } },
      { status: 201, body: { id: 'a2' } },
    ]);
    mockFetch({ 'POST /api/auth/refresh': { body: makeSession(testUsers.engineer, 'new-token') } });
    await expect(apiUpload(testPath('/x'), new FormData())).resolves.toEqual({ id: 'a2' });
    expect(sent.map((s) => s.headers.Authorization)).toEqual([
      'Bearer old-token',
      'Bearer new-token',
    ]);
  });

  it('throws the error envelope, e.g. a file that is too large', async () => {
    fakeXhr([
      {
        status: 413,
        body: { error: { code: 'payload_too_large', message: 'Files up to 20 MB.' } },
      },
    ]);
    const error = (await apiUpload(testPath('/x'), new FormData()).catch(
      (e: unknown) => e,
    )) as ApiRequestError;
    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error).toMatchObject({
      status: 413,
      code: 'payload_too_large',
      message: 'Files up to 20 MB.',
    });
  });
});
