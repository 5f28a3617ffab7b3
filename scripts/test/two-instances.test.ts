import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import {
  call,
  signIn,
  startFaultCluster,
  type FaultCluster,
  type Instance,
  makeHoistPosition,
  submittedSheet,
} from './support/fault-cluster.js';
import { startSmtpCapture, type SmtpCapture } from './support/smtp-capture.js';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * Two server processes on one database, as behind a load balancer: nothing a request needs may
 * live in one process's memory, background work must not run twice, and races between the
 * processes must be settled by PostgreSQL.
 */
describe('two server processes on one database', () => {
  let fc: FaultCluster;
  let a: Instance;
  let b: Instance;
  let smtp: SmtpCapture;
  let engineer: string;
  let positionId: string;

  beforeAll(async () => {
    smtp = await startSmtpCapture();
    fc = await startFaultCluster('twins', { postgres: 54660, servers: 4130 });
    const env = (label: string) => ({
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtp.port),
      MAIL_RETRY_DELAY_SECONDS: '1',
      OUTBOX_POLL_SECONDS: '0.5',
      DATA_DIR: mkdtempSync(path.join(tmpdir(), `holdfast-twin-${label}-`)),
    });
    [a, b] = await Promise.all([fc.startServer(env('a')), fc.startServer(env('b'))]);
    engineer = (await signIn(a.url, 'engineer')).token;
    positionId = await makeHoistPosition([b.url, a.url], engineer, {
      code: 'TWN',
      name: 'Twin works',
    });
  }, 150000);

  afterAll(async () => {
    await fc?.dispose();
    await smtp?.stop().catch(() => undefined);
  });

  const submittedOn = (server: Instance, title: string) =>
    submittedSheet(server.url, engineer, positionId, title);

  it('signs in on one and refreshes on the other; either accepts the access token', async () => {
    const session = await signIn(a.url, 'viewer');
    expect((await call(b.url, 'GET', '/api/auth/me', { token: session.token })).status).toBe(200);
    const refreshed = await call(b.url, 'POST', '/api/auth/refresh', { cookie: session.cookie });
    expect(refreshed.status, JSON.stringify(refreshed.body)).toBe(200);
    const next = refreshed.body.accessToken as string;
    expect((await call(a.url, 'GET', '/api/auth/me', { token: next })).status).toBe(200);
    const cookie = (refreshed.headers.get('set-cookie') ?? '').split(';')[0] ?? '';
    expect((await call(a.url, 'POST', '/api/auth/refresh', { cookie })).status).toBe(200);
  });

  it('runs a mail job once although both processes work the queue', async () => {
    const first = smtp.mails.length;
    const sheets = [await submittedOn(a, 'Mail once A'), await submittedOn(b, 'Mail once B')];
    const found = (doc: string) => smtp.mails.filter((m) => m.raw.includes(doc));
    const started = Date.now();
    while (!sheets.every((s) => found(s.documentNumber).length > 0) && Date.now() - started < 20000)
      await sleep(100);
    await sleep(3000); // both workers poll every 0.5 s: a second delivery would be here by now
    for (const s of sheets) expect(found(s.documentNumber), s.documentNumber).toHaveLength(1);
    expect(smtp.mails.length - first).toBe(sheets.length);
  });

  it('gives one winner when two checkers approve the same revision on different processes', async () => {
    const { revisionId } = await submittedOn(a, 'Approval race');
    const [checker, checker2] = await Promise.all([
      signIn(a.url, 'checker'),
      signIn(b.url, 'checker2'),
    ]);
    const rev = await call(a.url, 'GET', `/api/revisions/${revisionId}`, { token: checker.token });
    const body = { rowVersion: rev.body.rowVersion, note: 'Approved in the race test.' };
    const results = await Promise.all([
      call(a.url, 'POST', `/api/revisions/${revisionId}/approve`, { token: checker.token, body }),
      call(b.url, 'POST', `/api/revisions/${revisionId}/approve`, { token: checker2.token, body }),
    ]);
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([200, 409]);
    const loser = results.find((r) => r.status === 409)!;
    expect(loser.body.error.code).toBe('conflict');
    const rows = await fc.query<{ state: string; approved: number }>(
      `select state, (select count(*)::int from audit_events
                      where entity_id = $1::text and action = 'revision.approved') as approved
       from revisions where id::text = $1::text`,
      [revisionId],
    );
    expect(rows[0]).toEqual({ state: 'approved', approved: 1 });
  });

  // Last in this file: it kills process a.
  it('keeps serving on one process when the other is killed under load; sessions and mail go on', async () => {
    const session = await signIn(a.url, 'engineer2');
    const before = await submittedOn(a, 'Mail before the kill');
    const found = (doc: string) => smtp.mails.filter((m) => m.raw.includes(doc));
    for (const t = Date.now(); found(before.documentNumber).length === 0 && Date.now() - t < 20000;)
      await sleep(100);
    expect(found(before.documentNumber)).toHaveLength(1);

    let running = true;
    const answers: { on: 'a' | 'b'; status: number; at: number }[] = [];
    const load = async (on: 'a' | 'b') => {
      const base = on === 'a' ? a.url : b.url;
      while (running) {
        let status = 0;
        try {
          status = (await call(base, 'GET', '/api/sheets', { token: engineer, timeoutMs: 5000 }))
            .status;
        } catch {
          await sleep(50); // a is gone: no answer
        }
        answers.push({ on, status, at: Date.now() });
      }
    };
    const loaders = [load('a'), load('b'), load('b')];
    await sleep(1500);
    const killedAt = Date.now();
    a.child.kill('SIGKILL');
    await new Promise((resolve) => a.child.once('exit', resolve));
    await sleep(2000);
    // The session begun on a goes on on b: its access token and its refresh cookie.
    expect((await call(b.url, 'GET', '/api/auth/me', { token: session.token })).status).toBe(200);
    const refreshed = await call(b.url, 'POST', '/api/auth/refresh', { cookie: session.cookie });
    expect(refreshed.status, JSON.stringify(refreshed.body)).toBe(200);
    const after = await submittedOn(b, 'Mail after the kill');
    running = false;
    await Promise.all(loaders);

    const onB = answers.filter((x) => x.on === 'b');
    expect(onB.filter((x) => x.at > killedAt).length).toBeGreaterThan(10);
    expect(onB.filter((x) => x.status !== 200)).toEqual([]);
    expect(
      answers.filter((x) => x.on === 'a' && x.at < killedAt && x.status === 200).length,
    ).toBeGreaterThan(0);

    for (const t = Date.now(); found(after.documentNumber).length === 0 && Date.now() - t < 20000;)
      await sleep(100);
    await sleep(2000); // b polls every 0.5 s: a second delivery would be here by now
    expect(found(after.documentNumber)).toHaveLength(1);
    expect(found(before.documentNumber)).toHaveLength(1);
  }, 90000);
});
