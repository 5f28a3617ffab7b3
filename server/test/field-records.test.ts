import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { fieldCheckKeys } from '@holdfast/shared';
import { bandedTolerance, getSheetType } from '@holdfast/calc';
import { InspectionScheduleService } from '../src/field-records/inspection-schedule.service.js';
import { Database } from '../src/database/database.js';
import { ObjectStorage } from '../src/storage/object-storage.js';
import { ensurePoppler, inspectPdf } from '@holdfast/print/testing';
import {
  approve,
  createSheet,
  createSheetsContext,
  sheetsSuite,
  submit,
  waitFor,
  type SheetsContext,
} from './sheets-fixture.js';
import type { DemoLogin } from './test-context.js';

describe('field records', () => {
  const suite = sheetsSuite();
  let revisionId: string;
  let draftRevisionId: string;
  let targets: { settingKey: string; value: number; tolerance: unknown; inService?: unknown }[];

  beforeEach(async () => {
    const sheet = await createSheet(suite.ctx, suite.reg);
    const a = await submit(suite.ctx, sheet.revisions[0].id);
    await approve(suite.ctx, a.id);
    revisionId = a.id;
    const draft = await createSheet(suite.ctx, suite.reg, { title: 'Second brake' });
    draftRevisionId = draft.revisions[0].id;
    const form = await suite.ctx.request('GET', `/api/revisions/${revisionId}/field-form`, {
      as: 'technician',
    });
    expect(form.status, form.text).toBe(200);
    targets = form.body.targets;
  });

  const spring = () => targets.find((t) => t.settingKey === 'springLength')!;
  const body = (over: Record<string, unknown> = {}) => ({
    id: randomUUID(),
    positionId: suite.reg.positionId,
    revisionId,
    kind: 'commissioning',
    performedAt: '2026-11-30T09:00:00Z',
    measurements: [{ settingKey: 'springLength', asFound: null, asLeft: spring().value }],
    // Every item answered: a record is signed only then.
    checks: fieldCheckKeys.map((key) => ({ key, result: 'ok' })),
    ...over,
  });

  it('the form lists each target with its tolerance and its source', () => {
    const s = spring();
    expect(s.tolerance).toMatchObject({ source: 'common practice', band: { kind: 'absolute' } });
    expect(targets.find((t) => t.settingKey === 'holderBackOff')?.tolerance).toMatchObject({
      direction: 'loosen',
    });
  });

  it('a card tolerance that reaches past the band where every check passes is held inside it', async () => {
    const rev = await suite.ctx.request('GET', `/api/revisions/${revisionId}`, { as: 'engineer' });
    const ev = rev.body.evaluation;
    const force = targets.find((t) => t.settingKey === 'springForce')!;
    const setting = ev.fieldSettings.find((f: { key: string }) => f.key === 'springForce');
    const held = bandedTolerance(setting, getSheetType('hoist-shoe-brake')!.fieldCard, ev);
    expect(force.tolerance).toEqual(held);
    // The default hoist passes every check only close to its set force: ±5 % is cut back.
    expect(held?.source).toMatch(/narrowed to the band where every check of this sheet passes/);
    // 4 % low lies inside the card's ±5 % but outside the band: judged out.
    const created = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: body({
        measurements: [{ settingKey: 'springForce', asFound: null, asLeft: force.value * 0.96 }],
      }),
    });
    expect(created.status, created.text).toBe(201);
    expect(created.body.measurements[0].asLeftVerdict.status).toBe('out');
  });

  it('judges a reserve stroke as found against the in-service minimum, as left against the setting', async () => {
    const reserve = targets.find((t) => t.settingKey === 'reserveStroke')!;
    const minimum = targets.find((t) => t.settingKey === 'minReserveStroke')!;
    expect(reserve.inService).toMatchObject({
      value: minimum.value,
      tolerance: { band: { kind: 'atLeast' } },
    });
    // Found at 16 mm on an inspection (set to 20 mm, minimum 5 mm): lining wear, not a fault.
    const worn = 0.016;
    const created = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: body({
        kind: 'periodic-inspection',
        measurements: [{ settingKey: 'reserveStroke', asFound: worn, asLeft: worn }],
      }),
    });
    expect(created.status, created.text).toBe(201);
    const m = created.body.measurements[0];
    expect(m.asFoundVerdict.status).toBe('in');
    // Left at 16 mm, it is not what the card sets: judged against the setting's tolerance.
    expect(m.asLeftVerdict.status).toBe('out');
    // Found below the minimum: out.
    const below = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: body({
        kind: 'periodic-inspection',
        measurements: [
          { settingKey: 'reserveStroke', asFound: minimum.value * 0.8, asLeft: reserve.value },
        ],
      }),
    });
    expect(below.status, below.text).toBe(201);
    expect(below.body.measurements[0].asFoundVerdict.status).toBe('out');
  });

  it('a technician never sees a draft revision, nor makes a record against one', async () => {
    const rev = await suite.ctx.request('GET', `/api/revisions/${draftRevisionId}`, {
      as: 'technician',
    });
    expect(rev.body.inputs ?? null).toBeNull();
    const form = await suite.ctx.request('GET', `/api/revisions/${draftRevisionId}/field-form`, {
      as: 'technician',
    });
    expect(form.status).toBe(404);
    const res = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: body({ revisionId: draftRevisionId }),
    });
    expect(res.status).toBe(404);
  });

  it('create is idempotent by the client id: 201, then 200 with the same record, stored once', async () => {
    const b = body();
    const first = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: b,
    });
    expect(first.status, first.text).toBe(201);
    const again = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: b,
    });
    expect(again.status, again.text).toBe(200);
    expect(again.body.id).toBe(first.body.id);
    const list = await suite.ctx.request(
      'GET',
      `/api/field-records?positionId=${suite.reg.positionId}`,
      {
        as: 'viewer',
      },
    );
    expect(list.body.items).toHaveLength(1);
    // Ten retries racing each other still leave one record.
    const c = body();
    const raced = await Promise.all(
      Array.from({ length: 10 }, () =>
        suite.ctx.request('POST', '/api/field-records', { as: 'technician', body: c }),
      ),
    );
    expect(raced.map((r) => r.status).sort()).toEqual([
      200, 200, 200, 200, 200, 200, 200, 200, 200, 201,
    ]);
    const db = suite.ctx.app.get(Database);
    const n = await db
      .selectFrom('fieldRecords')
      .select((e) => e.fn.countAll<string>().as('n'))
      .executeTakeFirstOrThrow();
    expect(Number(n.n)).toBe(2);
  });

  it('bad input is a 400 with field paths', async () => {
    const res = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: body({
        kind: 'guesswork',
        measurements: [{ settingKey: 'springLength', asLeft: 'long' }],
      }),
    });
    expect(res.status).toBe(400);
    const paths = res.body.error.fields.map((f: { path: string }) => f.path);
    expect(paths).toEqual(expect.arrayContaining(['kind', 'measurements.0.asLeft']));
    const unknownKey = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: body({ measurements: [{ settingKey: 'nonsense', asLeft: 1 }] }),
    });
    expect(unknownKey.status).toBe(400);
    expect(unknownKey.body.error.fields[0].path).toBe('measurements.0.settingKey');
  });

  it('out of tolerance as left: no signature without a reason; with one, owner and plant engineers are told', async () => {
    const s = spring();
    const b = body({
      measurements: [{ settingKey: 'springLength', asFound: null, asLeft: s.value + 0.002 }],
    });
    const created = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: b,
    });
    expect(created.body.outOfTolerance).toBe(true);
    expect(created.body.measurements[0].asLeftVerdict).toMatchObject({ status: 'out' });
    const refused = await suite.ctx.request('POST', `/api/field-records/${b.id}/sign`, {
      as: 'technician',
      body: {},
    });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields[0].path).toBe('measurements.0.reason');
    const upd = await suite.ctx.request('PATCH', `/api/field-records/${b.id}`, {
      as: 'technician',
      body: {
        measurements: [
          {
            settingKey: 'springLength',
            asLeft: s.value + 0.002,
            reason: 'Adjuster nut seized; new nut ordered.',
          },
        ],
      },
    });
    expect(upd.status, upd.text).toBe(200);
    const signed = await suite.ctx.request('POST', `/api/field-records/${b.id}/sign`, {
      as: 'technician',
      body: {},
    });
    expect(signed.status, signed.text).toBe(200);
    expect(signed.body.status).toBe('signed');
    expect(signed.body.signed.by.initials).toBe('NH');
    expect(signed.body.verificationCode).toMatch(/^[A-Z2-7]{10}$/);
    const mail = await waitFor(() =>
      suite.ctx.smtp.mails.find((m) => m.raw.includes('out of tolerance')),
    );
    // The link opens the position's records screen (the UI's route), not a page that is not there.
    expect(mail.raw).toContain(`/positions/${suite.reg.positionId}/field`);
    // MH-B1 is on every crane: the subject names the machine and the site too.
    expect(mail.raw).toContain(
      'Subject: [Holdfast] MH-B1 on CR-01 (TST): value left out of tolerance',
    );
    expect(mail.to).toEqual(
      expect.arrayContaining([
        'engineer@holdfast.test',
        'checker@holdfast.test',
        'viewer@holdfast.test',
      ]),
    );
    const due = await suite.ctx.request('GET', '/api/field-records/due', { as: 'checker' });
    expect(due.body.awaitingCountersign).toEqual([
      expect.objectContaining({ recordId: b.id, outOfTolerance: true }),
    ]);
  });

  it('sign then countersign: by a plant engineer who did not sign; then the record is immutable', async () => {
    const b = body();
    await suite.ctx.request('POST', '/api/field-records', { as: 'technician', body: b });
    expect(
      (
        await suite.ctx.request('POST', `/api/field-records/${b.id}/countersign`, {
          as: 'checker',
          body: {},
        })
      ).status,
    ).toBe(409);
    await suite.ctx.request('POST', `/api/field-records/${b.id}/sign`, {
      as: 'technician',
      body: {},
    });
    expect(
      (
        await suite.ctx.request('POST', `/api/field-records/${b.id}/countersign`, {
          as: 'technician',
          body: {},
        })
      ).status,
    ).toBe(403);
    expect(
      (
        await suite.ctx.request('POST', `/api/field-records/${b.id}/countersign`, {
          as: 'admin',
          body: {},
        })
      ).status,
    ).toBe(403);
    const cs = await suite.ctx.request('POST', `/api/field-records/${b.id}/countersign`, {
      as: 'checker',
      body: { note: 'Seen on site.' },
    });
    expect(cs.status, cs.text).toBe(200);
    expect(cs.body.status).toBe('countersigned');
    const edit = await suite.ctx.request('PATCH', `/api/field-records/${b.id}`, {
      as: 'technician',
      body: { findings: 'changed later' },
    });
    expect(edit.status).toBe(409);
    const audit = await suite.ctx.app
      .get(Database)
      .selectFrom('auditEvents')
      .select('action')
      .where('entityId', '=', b.id)
      .orderBy('at')
      .execute();
    expect(audit.map((a) => a.action)).toEqual([
      'field-record.created',
      'field-record.signed',
      'field-record.countersigned',
    ]);
    const state = await suite.ctx.request(
      'GET',
      `/api/register/positions/${suite.reg.positionId}/field-state`,
      {
        as: 'technician',
      },
    );
    expect(state.body.setTo).toMatchObject({ revisionId, superseded: false });
  });

  it("who may write: only recorders create, only the maker edits and signs, no countersigning one's own", async () => {
    const post = (as: DemoLogin, path: string, b: unknown = {}) =>
      suite.ctx.request('POST', path, { as, body: b }).then((r) => r.status);
    expect(await post('viewer', '/api/field-records', body())).toBe(403);
    expect(await post('admin', '/api/field-records', body())).toBe(403);
    const fitter = body();
    expect(await post('technician', '/api/field-records', fitter)).toBe(201);
    const patch = await suite.ctx.request('PATCH', `/api/field-records/${fitter.id}`, {
      as: 'engineer',
      body: { findings: 'not mine to write' },
    });
    expect(patch.status).toBe(403);
    expect(await post('engineer', `/api/field-records/${fitter.id}/sign`)).toBe(403);
    // An engineer may record field work too, but a second person countersigns it.
    const own = body();
    expect(await post('engineer', '/api/field-records', own)).toBe(201);
    expect(await post('engineer', `/api/field-records/${own.id}/sign`)).toBe(200);
    expect(await post('engineer', `/api/field-records/${own.id}/countersign`)).toBe(403);
    expect(await post('checker', `/api/field-records/${own.id}/countersign`)).toBe(200);
    // The plant engineer (the viewer role) countersigns a fitter's record; a fitter or an
    // administrator does not.
    expect(await post('technician', `/api/field-records/${fitter.id}/sign`)).toBe(200);
    expect(await post('admin', `/api/field-records/${fitter.id}/countersign`)).toBe(403);
    expect(await post('technician', `/api/field-records/${fitter.id}/countersign`)).toBe(403);
    const due = await suite.ctx.request('GET', '/api/field-records/due', { as: 'viewer' });
    expect(due.body.awaitingCountersign).toEqual([
      expect.objectContaining({
        recordId: fitter.id,
        positionId: suite.reg.positionId,
        positionTag: 'MH-B1',
        machineTag: 'CR-01',
        siteCode: 'TST',
      }),
    ]);
    expect(await post('viewer', `/api/field-records/${fitter.id}/countersign`)).toBe(200);
  });

  it('prints the record with targets, tolerances, signatures and a code /verify answers for', async () => {
    ensurePoppler();
    const b = body({
      measurements: [
        { settingKey: 'springLength', asFound: 0.2, asLeft: spring().value, reason: '' },
      ],
      findings: 'Lining at 9 mm on both shoes.',
    });
    await suite.ctx.request('POST', '/api/field-records', { as: 'technician', body: b });
    const signed = await suite.ctx.request('POST', `/api/field-records/${b.id}/sign`, {
      as: 'technician',
      body: {},
    });
    const res = await fetch(`${suite.ctx.baseUrl}/api/field-records/${b.id}/pdf`, {
      headers: { authorization: `Bearer ${await suite.ctx.token('viewer')}` },
    });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toContain('application/pdf');
    const facts = inspectPdf(Buffer.from(await res.arrayBuffer()), 'field-record');
    facts.text = facts.text.replace(/\s+/g, ' ');
    expect(facts.text).toContain('Field record');
    expect(facts.text).toContain('Main spring length as set');
    expect(facts.text).toMatch(/± 0\.50* mm/);
    expect(facts.text).toContain('Noor Halden (NH)');
    expect(facts.text).toContain(signed.body.verificationCode);
    expect(facts.text).toContain('Lining at 9 mm on both shoes.');
    expect(facts.fonts.length).toBeGreaterThan(0);
    expect(facts.fonts.every((f) => f.embedded)).toBe(true);
    const v = await suite.ctx.request('GET', `/api/verify/${signed.body.verificationCode}`);
    expect(v.status).toBe(200);
    expect(v.body).toMatchObject({
      kind: 'field-record',
      status: 'signed',
      setTo: { revisionLabel: 'A', current: true },
    });
  });

  /** Posts a photo to a record as a fitter's device does (multipart), as `as`. */
  const photoSender =
    (recordId: string) =>
    async (bytes: Buffer, name: string, as: DemoLogin = 'technician') => {
      const form = new FormData();
      form.append('file', new Blob([new Uint8Array(bytes)]), name);
      const res = await fetch(`${suite.ctx.baseUrl}/api/field-records/${recordId}/attachments`, {
        method: 'POST',
        headers: { authorization: `Bearer ${await suite.ctx.token(as)}` },
        body: form,
      });
      return { status: res.status, body: (await res.json()) as any };
    };

  it('photos go through the attachment path, owned by the record, and only onto a draft', async () => {
    const b = body();
    await suite.ctx.request('POST', '/api/field-records', { as: 'technician', body: b });
    const send = photoSender(b.id);
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0]);
    const ok = await send(png, 'shoe-a.png');
    expect(ok.status).toBe(201);
    expect((await send(Buffer.from('not a photo'), 'x.png')).status).toBe(415);
    // An engineer may record field work, but adds photos only to records of their own.
    expect((await send(png, 'other.png', 'engineer')).status).toBe(403);
    expect((await send(png, 'viewer.png', 'viewer')).status).toBe(403);
    const list = await suite.ctx.request('GET', `/api/field-records/${b.id}/attachments`, {
      as: 'viewer',
    });
    expect(list.body.items.map((a: { id: string }) => a.id)).toEqual([ok.body.id]);
    const revFiles = await suite.ctx.request('GET', `/api/revisions/${revisionId}/attachments`, {
      as: 'engineer',
    });
    expect(revFiles.body.items).toEqual([]);
    const dl = await fetch(`${suite.ctx.baseUrl}/api/attachments/${ok.body.id}/download`, {
      headers: { authorization: `Bearer ${await suite.ctx.token('technician')}` },
    });
    expect(Buffer.from(await dl.arrayBuffer())).toEqual(png);
    await suite.ctx.request('POST', `/api/field-records/${b.id}/sign`, {
      as: 'technician',
      body: {},
    });
    const other = Buffer.concat([png, Buffer.from([1])]);
    expect((await send(other, 'late.png')).status).toBe(409);
    // The printed record names its photo and the start of its hash, to match the stored file.
    ensurePoppler();
    const pdf = await fetch(`${suite.ctx.baseUrl}/api/field-records/${b.id}/pdf`, {
      headers: { authorization: `Bearer ${await suite.ctx.token('viewer')}` },
    });
    const text = inspectPdf(Buffer.from(await pdf.arrayBuffer()), 'field-record-photo').text;
    expect(text.replace(/\s+/g, ' ')).toContain(`shoe-a.png`);
    expect(text).toContain(ok.body.sha256.slice(0, 16));
    expect(text).not.toContain('late.png');
  });

  it('a photo sent again (its answer lost) is filed once, even when both sends arrive at once', async () => {
    const b = body();
    await suite.ctx.request('POST', '/api/field-records', { as: 'technician', body: b });
    const send = photoSender(b.id);
    const png = (n: number) =>
      Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, n]);
    const storage = suite.ctx.app.get(ObjectStorage);
    const put = vi.spyOn(storage, 'put');
    const removed = vi.spyOn(storage, 'delete');
    const first = await send(png(1), 'shoe-a.png');
    expect(first.status).toBe(201);
    const again = await send(png(1), 'shoe-a.png');
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    // Two sends of another photo racing each other: one row between them.
    const [x, y] = await Promise.all([send(png(2), 'b.png'), send(png(2), 'b.png')]);
    expect([x.status, y.status]).toEqual([201, 201]);
    expect(x.body.id).toBe(y.body.id);
    // Someone else sending the same bytes is still refused.
    expect((await send(png(1), 'x.png', 'engineer')).status).toBe(403);
    const list = await suite.ctx.request('GET', `/api/field-records/${b.id}/attachments`, {
      as: 'technician',
    });
    expect(list.body.items.map((a: { id: string }) => a.id).sort()).toEqual(
      [first.body.id, x.body.id].sort(),
    );
    const audit = await suite.ctx.db
      .selectFrom('auditEvents')
      .select('action')
      .where('entityId', '=', b.id)
      .where('action', '=', 'field-record.photo-added')
      .execute();
    expect(audit).toHaveLength(2);
    // Every object stored is a filed photo's, or was removed again: no bytes left behind.
    const kept = await suite.ctx.db
      .selectFrom('attachments')
      .select('storageKey')
      .where('fieldRecordId', '=', b.id)
      .execute();
    const deleted = removed.mock.calls.map(([key]) => key);
    expect(put.mock.calls.map(([key]) => key).sort()).toEqual(
      [...kept.map((k) => k.storageKey), ...deleted].sort(),
    );
    put.mockRestore();
    removed.mockRestore();
    // Once signed, the filed photo is still answered as filed; new bytes are refused.
    await suite.ctx.request('POST', `/api/field-records/${b.id}/sign`, {
      as: 'technician',
      body: {},
    });
    expect((await send(png(1), 'shoe-a.png')).body.id).toBe(first.body.id);
    expect((await send(png(3), 'late.png')).status).toBe(409);
  });

  it('a record made against a revision since superseded is flagged', async () => {
    const b = body();
    await suite.ctx.request('POST', '/api/field-records', { as: 'technician', body: b });
    const sheetId = (
      await suite.ctx.request('GET', `/api/revisions/${revisionId}`, { as: 'engineer' })
    ).body.sheetId;
    const next = await suite.ctx.request('POST', `/api/sheets/${sheetId}/revisions`, {
      as: 'engineer',
      body: { changeNote: 'B.' },
    });
    await submit(suite.ctx, next.body.id);
    await approve(suite.ctx, next.body.id);
    const got = await suite.ctx.request('GET', `/api/field-records/${b.id}`, { as: 'technician' });
    expect(got.body.flags).toEqual({ superseded: true, underReview: false });
    expect(got.body).toMatchObject({ positionTag: 'MH-B1', machineTag: 'CR-01', siteCode: 'TST' });
    const listed = await suite.ctx.request(
      'GET',
      `/api/field-records?positionId=${suite.reg.positionId}`,
      { as: 'technician' },
    );
    expect(listed.body.items).toContainEqual(
      expect.objectContaining({ id: b.id, machineTag: 'CR-01', siteCode: 'TST' }),
    );
  });

  it('due and overdue lists, and a reminder sent once ahead of the due date', async () => {
    const put = await suite.ctx.request(
      'PUT',
      `/api/register/positions/${suite.reg.positionId}/inspection-interval`,
      {
        as: 'engineer',
        body: { basis: 'days', every: 30, remindDaysAhead: 7 },
      },
    );
    expect(put.status, put.text).toBe(200);
    const b = body({ performedAt: new Date(Date.now() - 25 * 86_400_000).toISOString() });
    await suite.ctx.request('POST', '/api/field-records', { as: 'technician', body: b });
    await suite.ctx.request('POST', `/api/field-records/${b.id}/sign`, {
      as: 'technician',
      body: {},
    });
    const due = await suite.ctx.request('GET', '/api/field-records/due', { as: 'technician' });
    expect(due.body.due.map((d: { positionId: string }) => d.positionId)).toEqual([
      suite.reg.positionId,
    ]);
    expect(due.body.overdue).toEqual([]);
    const schedule = suite.ctx.app.get(InspectionScheduleService);
    expect(await schedule.sendReminders()).toBe(1);
    expect(await schedule.sendReminders()).toBe(0);
    const reminder = await waitFor(() =>
      suite.ctx.smtp.mails.find((m) => m.raw.includes('inspection due')),
    );
    expect(reminder.raw).toContain(`/positions/${suite.reg.positionId}/field`);
    expect(reminder.raw).toContain('Subject: [Holdfast] MH-B1 on CR-01 (TST): inspection due');
    await new Promise((r) => setTimeout(r, 1500));
    expect(suite.ctx.smtp.mails.filter((m) => m.raw.includes('inspection due'))).toHaveLength(1);
    const later = await schedule.due(
      { id: randomUUID(), role: 'technician' } as never,
      new Date(Date.now() + 10 * 86_400_000),
    );
    expect(later.overdue.map((d) => d.positionId)).toEqual([suite.reg.positionId]);
  });
});

describe('field-record routes × roles', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    ctx = await createSheetsContext();
    await ctx.resetAll();
  });
  afterAll(() => ctx?.closeAll());

  const NIL = '00000000-0000-4000-8000-000000000000';
  // Probes with an empty body or an id that matches nothing: allowed callers reach validation
  // (400) or a missing row (404); the rest get 401/403 from the guard.
  const rows: [string, string, Record<string, number>, unknown?][] = [
    [
      'GET',
      '/api/field-records',
      { anonymous: 401, engineer: 200, checker: 200, viewer: 200, admin: 200, technician: 200 },
    ],
    [
      'POST',
      '/api/field-records',
      { anonymous: 401, engineer: 400, checker: 400, viewer: 403, admin: 403, technician: 400 },
      {},
    ],
    [
      'PATCH',
      `/api/field-records/${NIL}`,
      { anonymous: 401, engineer: 404, checker: 404, viewer: 403, admin: 403, technician: 404 },
      {},
    ],
    [
      'POST',
      `/api/field-records/${NIL}/sign`,
      { anonymous: 401, engineer: 404, checker: 404, viewer: 403, admin: 403, technician: 404 },
      {},
    ],
    [
      'POST',
      `/api/field-records/${NIL}/countersign`,
      { anonymous: 401, engineer: 404, checker: 404, viewer: 404, admin: 403, technician: 403 },
      {},
    ],
    [
      'PUT',
      `/api/register/positions/${NIL}/inspection-interval`,
      { anonymous: 401, engineer: 400, checker: 400, viewer: 403, admin: 403, technician: 403 },
      {},
    ],
    [
      'GET',
      `/api/register/positions/${NIL}/field-state`,
      { anonymous: 401, engineer: 404, checker: 404, viewer: 404, admin: 404, technician: 404 },
    ],
  ];
  for (const [method, path, want, body] of rows) {
    it(`${method} ${path.replace(NIL, ':id')}`, async () => {
      const got: Record<string, number> = {};
      for (const caller of Object.keys(want)) {
        const res = await ctx.request(method, path, {
          ...(caller === 'anonymous' ? {} : { as: caller as 'technician' }),
          ...(body !== undefined ? { body } : {}),
        });
        got[caller] = res.status;
      }
      expect(got).toEqual(want);
    });
  }
});
