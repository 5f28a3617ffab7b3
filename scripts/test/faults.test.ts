import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync } from 'node:fs';
import { createServer, type Socket } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
// @ts-expect-error plain ESM helper without type declarations
import { freePortFrom } from '../lib/postgres.mjs';
import {
  call,
  projectDir,
  signIn,
  startFaultCluster,
  type FaultCluster,
  type Instance,
  makeHoistPosition,
  submittedSheet,
} from './support/fault-cluster.js';
import { startSmtpCapture, type SmtpCapture } from './support/smtp-capture.js';
import { emptyAcks, halfRecordQueries, workflowWorker } from './support/workflow-load.js';
import {
  correctedLength,
  correctionOf,
  emptyFieldRecordAcks,
  fieldRecordHalfQueries,
  fieldRecordWorker,
} from './support/field-record-load.js';

/**
 * Faults on a real server process against a PostgreSQL cluster of its own (see
 * support/fault-cluster.ts), a real SMTP capture and an S3 fake outside the server, so each can
 * be taken away and brought back. Timings are measured from outside, as a client would see them.
 *
 * Scaled down to keep `npm test` short: the mail relay is down for SMTP_OUTAGE_MS (5 s; override
 * with HOLDFAST_FAULT_SMTP_OUTAGE_MS) with a first retry delay of 1 s, where production has 10 s;
 * the ratio of outage to retry delay is that of a one-minute outage.
 */
const SMTP_OUTAGE_MS = Number(process.env.HOLDFAST_FAULT_SMTP_OUTAGE_MS ?? 5000);
const PG_ROUNDS = 5;
/** Crashes during the save–submit–approve load (each round is a few seconds). */
const WORKFLOW_ROUNDS = 3;
/** Crashes while fitters create and sign field records. */
const FIELD_ROUNDS = 3;
const RECOVERY_LIMIT_MS = 2000;
const S3_TIMEOUT_MS = 2000;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function startS3(port: number, directory: string) {
  const mod = await import(path.join(projectDir, 'server/dist/storage/local-s3.js'));
  return mod.startLocalS3({ directory, bucket: 'holdfast-faults', port }) as Promise<{
    close(): Promise<void>;
  }>;
}

describe('faults on a running server', () => {
  let fc: FaultCluster;
  let srv: Instance;
  let smtp: SmtpCapture;
  let s3: { close(): Promise<void> };
  let s3Port: number;
  const s3Dir = mkdtempSync(path.join(tmpdir(), 'holdfast-faults-s3-'));
  let engineer: string;
  let positionId: string;

  beforeAll(async () => {
    smtp = await startSmtpCapture();
    s3Port = await freePortFrom(4750);
    s3 = await startS3(s3Port, s3Dir);
    fc = await startFaultCluster('faults', { postgres: 54610, servers: 3960 });
    srv = await fc.startServer({
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtp.port),
      MAIL_RETRY_DELAY_SECONDS: '1',
      MAIL_RETRY_LIMIT: '30',
      OUTBOX_POLL_SECONDS: '0.5',
      S3_EMBEDDED: '0',
      S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
      S3_BUCKET: 'holdfast-faults',
      S3_TIMEOUT_MS: String(S3_TIMEOUT_MS),
    });
    engineer = (await signIn(srv.url, 'engineer')).token;
    positionId = await makeHoistPosition([srv.url], engineer, { code: 'FLT', name: 'Fault works' });
  }, 150000);

  afterAll(async () => {
    await fc?.dispose();
    await smtp?.stop().catch(() => undefined);
    await s3?.close().catch(() => undefined);
  });

  it(`stays up through ${PG_ROUNDS} PostgreSQL crashes under a write load, loses no acknowledged write and is back within 2 s`, async () => {
    const acked: string[] = [];
    const okAt: number[] = [];
    const failures: { status: number; code?: string; retryAfter: string | null }[] = [];
    let n = 0;
    let running = true;
    const writer = async () => {
      while (running) {
        const code = `W${(n++).toString(36).toUpperCase().padStart(4, '0')}`;
        try {
          const res = await call(srv.url, 'POST', '/api/register/sites', {
            token: engineer,
            body: { code, name: `Load site ${code}` },
          });
          if (res.status === 201) {
            acked.push(code);
            okAt.push(Date.now());
            continue;
          }
          failures.push({
            status: res.status,
            code: res.body?.error?.code,
            retryAfter: res.headers.get('retry-after'),
          });
        } catch {
          failures.push({ status: 0, retryAfter: null }); // no answer at all: the server is gone
        }
        await sleep(25);
      }
    };
    const alive = () => srv.child.exitCode === null && srv.child.signalCode === null;
    const writers = Array.from({ length: 4 }, writer);
    const recoveries: number[] = [];
    for (let round = 0; round < PG_ROUNDS; round++) {
      // A few writes acknowledged before each crash (the machine may be slow: wait for them).
      const before = acked.length;
      const waitFrom = Date.now();
      while (acked.length < before + 3 && Date.now() - waitFrom < 15000 && alive()) await sleep(10);
      expect(alive(), `the server died:\n${srv.output()}`).toBe(true);
      expect(acked.length, 'writes go through before the crash').toBeGreaterThanOrEqual(before + 3);
      await fc.crash();
      await sleep(700);
      await fc.restart();
      const upAt = Date.now();
      const deadline = upAt + 15000;
      while (!okAt.some((t) => t > upAt) && Date.now() < deadline) await sleep(5);
      recoveries.push(Math.min(...okAt.filter((t) => t > upAt)) - upAt);
    }
    running = false;
    await Promise.all(writers);
    console.log(
      `PostgreSQL crash test: ${acked.length} writes acknowledged, ${failures.length} refused; ` +
        `first acknowledged write after restart: ${recoveries.map((r) => `${r} ms`).join(', ')}`,
    );

    expect(srv.child.exitCode, srv.output()).toBeNull();
    expect(srv.child.signalCode).toBeNull();
    expect(failures.length, 'the outages were seen').toBeGreaterThan(0);
    for (const f of failures)
      expect(f).toEqual({ status: 503, code: 'service_unavailable', retryAfter: '2' });
    for (const r of recoveries) expect(r).toBeLessThan(RECOVERY_LIMIT_MS);
    const stored = await fc.query<{ code: string }>(`select code from sites where code = any($1)`, [
      acked,
    ]);
    expect(new Set(stored.map((r) => r.code))).toEqual(new Set(acked));
    expect((await call(srv.url, 'GET', '/api/health')).status).toBe(200);
  }, 120000);

  const submitted = (title: string) => submittedSheet(srv.url, engineer, positionId, title);

  it('delivers every mail exactly once after the mail relay was down', async () => {
    await smtp.stop();
    const sheets = [];
    for (let i = 0; i < 4; i++) sheets.push(await submitted(`Mail outage ${i}`));
    await sleep(SMTP_OUTAGE_MS);
    const tried = await fc.query<{ attempts: number; sent_at: Date | null }>(
      `select attempts, sent_at from outbox`,
    );
    expect(tried.length).toBe(sheets.length);
    for (const row of tried) {
      expect(row.sent_at).toBeNull();
      expect(row.attempts, 'delivery was tried during the outage').toBeGreaterThanOrEqual(1);
    }
    const back = Date.now();
    await smtp.start();
    const found = (doc: string) => smtp.mails.filter((m) => m.raw.includes(doc));
    while (!sheets.every((s) => found(s.documentNumber).length > 0) && Date.now() - back < 40000)
      await sleep(100);
    const deliveredIn = Date.now() - back;
    await sleep(3000); // time for a duplicate to show up, if there were one
    console.log(
      `SMTP outage test: ${SMTP_OUTAGE_MS} ms down, all mail delivered ${deliveredIn} ms after it came back`,
    );
    for (const s of sheets) expect(found(s.documentNumber), s.documentNumber).toHaveLength(1);
    expect(smtp.mails).toHaveLength(sheets.length);
    const rows = await fc.query<{ n: number }>(
      `select count(*)::int as n from outbox where sent_at is null`,
    );
    expect(rows[0]!.n).toBe(0);
  }, 90000);

  const newDraft = async (title: string) => {
    const draft = await call(srv.url, 'POST', '/api/sheets', {
      token: engineer,
      body: { title, positionId, sheetType: 'hoist-shoe-brake' },
    });
    return draft.body.revisions[0].id as string;
  };
  const upload = async (draftId: string) => {
    const form = new FormData();
    const pdf = '%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n';
    form.append('file', new Blob([pdf]), 'datasheet.pdf');
    const res = await fetch(`${srv.url}/api/revisions/${draftId}/attachments`, {
      method: 'POST',
      headers: { authorization: `Bearer ${engineer}` },
      body: form,
      signal: AbortSignal.timeout(30000),
    });
    return {
      status: res.status,
      body: await res.json(),
      retryAfter: res.headers.get('retry-after'),
    };
  };
  const attachmentCount = async (draftId: string) =>
    (
      await fc.query<{ a: number; e: number }>(
        `select (select count(*)::int from attachments where revision_id = $1) as a,
                (select count(*)::int from audit_events where entity = 'attachment') as e`,
        [draftId],
      )
    )[0]!;

  it('answers 503 while object storage is down and keeps no half record', async () => {
    const draftId = await newDraft('Storage outage draft');
    const before = await attachmentCount(draftId);
    await s3.close();
    const down = await upload(draftId);
    expect(down.status).toBe(503);
    expect(down.body).toEqual({
      error: { code: 'service_unavailable', message: expect.any(String) },
    });
    expect(down.retryAfter).toBe('2');
    expect(await attachmentCount(draftId)).toEqual(before);
    s3 = await startS3(s3Port, s3Dir);
    const up = await upload(draftId);
    expect(up.status, JSON.stringify(up.body)).toBe(201);
    expect((await attachmentCount(draftId)).a).toBe(before.a + 1);
  }, 60000);

  it('gives up on object storage that hangs within a bounded time: 503 and no half record', async () => {
    const draftId = await newDraft('Storage hang draft');
    const before = await attachmentCount(draftId);
    await s3.close();
    // Accepts every connection and reads what comes, and never answers.
    const sockets = new Set<Socket>();
    const hang = createServer((socket) => {
      sockets.add(socket);
      socket.on('data', () => undefined);
      socket.on('error', () => undefined);
    });
    await new Promise<void>((resolve) => hang.listen(s3Port, '127.0.0.1', resolve));
    try {
      const started = Date.now();
      const hung = await upload(draftId);
      const took = Date.now() - started;
      console.log(`Object storage hanging: upload answered ${hung.status} after ${took} ms`);
      expect(hung.status).toBe(503);
      expect(hung.body.error.code).toBe('service_unavailable');
      expect(hung.retryAfter).toBe('2');
      // Two attempts of S3_TIMEOUT_MS each, and some slack for a loaded machine.
      expect(took).toBeLessThan(2 * S3_TIMEOUT_MS + 4000);
      expect(sockets.size, 'the server did reach the hanging storage').toBeGreaterThan(0);
      expect(await attachmentCount(draftId)).toEqual(before);
      expect((await call(srv.url, 'GET', '/api/health')).status).toBe(200);
    } finally {
      for (const socket of sockets) socket.destroy();
      await new Promise((resolve) => hang.close(resolve));
    }
    s3 = await startS3(s3Port, s3Dir);
    const up = await upload(draftId);
    expect(up.status, JSON.stringify(up.body)).toBe(201);
    expect((await attachmentCount(draftId)).a).toBe(before.a + 1);
  }, 60000);

  /**
   * Crashes PostgreSQL `rounds` times, each once every one of `counts` has moved since the round
   * began (or after 20 s), and restarts it; returns, per round, the time from the restart to the
   * first acknowledged write (`okAt`).
   */
  const crashRounds = async (rounds: number, counts: () => number[], okAt: number[]) => {
    const recoveries: number[] = [];
    for (let round = 0; round < rounds; round++) {
      const seen = counts();
      const waitFrom = Date.now();
      while (counts().some((n, i) => n === seen[i]) && Date.now() - waitFrom < 20000)
        await sleep(10);
      await fc.crash();
      await sleep(500);
      await fc.restart();
      const upAt = Date.now();
      while (!okAt.some((t) => t > upAt) && Date.now() - upAt < 15000) await sleep(5);
      recoveries.push(Math.min(...okAt.filter((t) => t > upAt)) - upAt);
    }
    return recoveries;
  };

  it(`keeps every acknowledged field record, correction and signature through ${FIELD_ROUNDS} crashes, each once and none in part`, async () => {
    // A released revision of the position's sheet, as the fitters work against.
    const { revisionId } = await submitted('Field records under crashes');
    const checker = (await signIn(srv.url, 'checker')).token;
    const rev = await call(srv.url, 'GET', `/api/revisions/${revisionId}`, { token: checker });
    const approved = await call(srv.url, 'POST', `/api/revisions/${revisionId}/approve`, {
      token: checker,
      // A note, as approving a revision with failing checks asks for one.
      body: { rowVersion: rev.body.rowVersion, note: 'Approved for the fault test.' },
    });
    expect(approved.status, JSON.stringify(approved.body)).toBe(200);
    const technician = (await signIn(srv.url, 'technician')).token;
    const form = await call(srv.url, 'GET', `/api/revisions/${revisionId}/field-form`, {
      token: technician,
    });
    expect(form.status, JSON.stringify(form.body)).toBe(200);
    const springLength = (form.body.targets as { settingKey: string; value: number }[]).find(
      (t) => t.settingKey === 'springLength',
    )!.value;

    const acks = emptyFieldRecordAcks();
    let running = true;
    const workers = Array.from({ length: 3 }, () =>
      fieldRecordWorker(
        srv.url,
        technician,
        { positionId, revisionId, springLength },
        () => running,
        acks,
      ),
    );
    const recoveries = await crashRounds(
      FIELD_ROUNDS,
      () => [acks.created.length, acks.signed.length],
      acks.okAt,
    );
    running = false;
    await Promise.all(workers);
    console.log(
      `PostgreSQL crash under field records: ${acks.created.length} created, ${acks.corrected.length} corrected, ${acks.signed.length} signed ` +
        `(${acks.inDoubt.length} found signed after a failed answer); ${acks.failures.length} refused; ` +
        `first write after restart: ${recoveries.map((r) => `${r} ms`).join(', ')}`,
    );

    expect(srv.child.exitCode, srv.output()).toBeNull();
    expect(acks.failures.length, 'the outages were seen').toBeGreaterThan(0);
    for (const f of acks.failures)
      expect(f).toEqual({ status: 503, code: 'service_unavailable', retryAfter: '2' });
    for (const r of recoveries) expect(r).toBeLessThan(RECOVERY_LIMIT_MS);
    expect(acks.signed.length).toBeGreaterThan(0);
    const rows = await fc.query<{ id: string; status: string }>(
      `select id, status from field_records where id = any($1)`,
      [acks.created],
    );
    expect(rows).toHaveLength(acks.created.length);
    const status = new Map(rows.map((r) => [r.id, r.status]));
    for (const id of [...acks.signed, ...acks.inDoubt]) expect(status.get(id), id).toBe('signed');
    // An acknowledged correction is what the record holds, signed or not: the findings and the
    // as-left value it sent, and the creation's values nowhere.
    expect(acks.corrected.length).toBeGreaterThan(0);
    const corrected = await fc.query<{ id: string; findings: string; as_left: number }>(
      `select f.id, f.findings, m.as_left from field_records f
       join field_record_measurements m on m.record_id = f.id where f.id = any($1)`,
      [acks.corrected],
    );
    expect(corrected).toHaveLength(acks.corrected.length);
    const record = { springLength };
    for (const row of corrected) {
      expect(row.findings, row.id).toBe(correctionOf(row.id, record).findings);
      expect(row.as_left, row.id).toBeCloseTo(correctedLength(record), 12);
    }
    for (const [what, q] of Object.entries(fieldRecordHalfQueries))
      expect(await fc.query(q), what).toEqual([]);
  }, 150000);

  // Last: it leaves mail jobs that were in hand at a crash until they expire.
  it(`keeps every acknowledged save, submission and approval through ${WORKFLOW_ROUNDS} crashes, and half of none`, async () => {
    const checker = (await signIn(srv.url, 'checker')).token;
    const acks = emptyAcks();
    let running = true;
    const workers = ['a', 'b', 'c'].map((label) =>
      workflowWorker(srv.url, { engineer, checker }, positionId, label, () => running, acks),
    );
    // Crash with work of every kind done since the last round, so each kind meets a crash.
    const recoveries = await crashRounds(
      WORKFLOW_ROUNDS,
      () => [acks.saved.length, acks.submitted.length, acks.approved.length],
      acks.okAt,
    );
    running = false;
    await Promise.all(workers);
    console.log(
      `PostgreSQL crash under the workflow: ${acks.created.length} sheets, ${acks.saved.length} saves, ` +
        `${acks.submitted.length} submissions, ${acks.approved.length} approvals acknowledged; ` +
        `${acks.failures.length} refused; first write after restart: ${recoveries.map((r) => `${r} ms`).join(', ')}`,
    );

    expect(srv.child.exitCode, srv.output()).toBeNull();
    expect(acks.failures.length, 'the outages were seen').toBeGreaterThan(0);
    for (const f of acks.failures)
      expect(f).toEqual({ status: 503, code: 'service_unavailable', retryAfter: '2' });
    for (const r of recoveries) expect(r).toBeLessThan(RECOVERY_LIMIT_MS);
    expect(acks.approved.length).toBeGreaterThan(0);

    const sheets = await fc.query<{ id: string }>(`select id from sheets where id = any($1)`, [
      acks.created,
    ]);
    expect(sheets).toHaveLength(acks.created.length);
    const revs = await fc.query<{ id: string; state: string; change_note: string }>(
      `select id, state, change_note from revisions where id = any($1)`,
      [acks.saved.map((s) => s.revisionId)],
    );
    const byId = new Map(revs.map((r) => [r.id, r]));
    for (const s of acks.saved) expect(byId.get(s.revisionId)?.change_note).toBe(s.note);
    const states = await fc.query<{ id: string; state: string }>(
      `select id, state from revisions where id = any($1)`,
      [[...acks.submitted, ...acks.approved]],
    );
    const state = new Map(states.map((r) => [r.id, r.state]));
    for (const id of acks.submitted) expect(['in_check', 'approved']).toContain(state.get(id));
    for (const id of acks.approved) expect(state.get(id)).toBe('approved');
    for (const [what, q] of Object.entries(halfRecordQueries))
      expect(await fc.query(q), what).toEqual([]);
  }, 150000);
});
