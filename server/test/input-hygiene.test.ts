import { MAX_ATTACHMENT_BYTES } from '@holdfast/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  createSheet,
  createSheetsContext,
  getRevision,
  makeRegister,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

async function upload(ctx: SheetsContext, revisionId: string, bytes: Buffer, name: string) {
  const form = new FormData();
  form.append('file', new Blob([new Uint8Array(bytes)]), name);
  const res = await fetch(`${ctx.baseUrl}/api/revisions/${revisionId}/attachments`, {
    method: 'POST',
    headers: { authorization: `Bearer ${await ctx.token('engineer')}` },
    body: form,
  });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : undefined };
}

const fieldsOf = (body: { error: { fields?: { path: string; message: string }[] } }) =>
  body.error.fields?.map((f) => f.path);

describe('input hygiene', () => {
  let ctx: SheetsContext;
  let reg: Register;
  let revisionId: string;
  beforeAll(async () => {
    ctx = await createSheetsContext({
      ATTACHMENTS_PER_REVISION: '3',
      ATTACHMENT_MB_PER_REVISION: '1',
    });
  });
  beforeEach(async () => {
    await ctx.resetAll();
    reg = await makeRegister(ctx);
    revisionId = (await createSheet(ctx, reg)).revisions[0]!.id;
  });
  afterAll(() => ctx?.closeAll());

  it('answers NUL in a title, a comment or a display name with 400 and the field path', async () => {
    const sheet = await ctx.request('POST', '/api/sheets', {
      as: 'engineer',
      body: {
        title: 'Hoist\u0000brake',
        positionId: reg.positionId,
        sheetType: 'hoist-shoe-brake',
      },
    });
    expect(sheet.status).toBe(400);
    expect(fieldsOf(sheet.body)).toEqual(['title']);

    const comment = await ctx.request('POST', `/api/revisions/${revisionId}/comments`, {
      as: 'engineer',
      body: { body: 'see \u0000 here' },
    });
    expect(comment.status).toBe(400);
    expect(fieldsOf(comment.body)).toEqual(['body']);

    const user = await ctx.request('PATCH', `/api/users/${await ctx.userId('viewer')}`, {
      as: 'admin',
      body: { displayName: 'Pia\u0000Novak' },
    });
    expect(user.status).toBe(400);
    expect(fieldsOf(user.body)).toEqual(['displayName']);
  });

  it('refuses NUL inside free JSON (sheet inputs) with its path, and other control characters', async () => {
    const rev = await getRevision(ctx, revisionId);
    const [key, value] = Object.entries(rev.inputs as Record<string, { unit?: string }>)[0]!;
    const save = await ctx.request('PUT', `/api/revisions/${revisionId}`, {
      as: 'engineer',
      body: {
        inputs: { ...rev.inputs, [key]: { ...value, unit: 'k\u0000N' } },
        unitSystem: rev.unitSystem,
        changeNote: '',
        rowVersion: rev.rowVersion,
      },
    });
    expect(save.status).toBe(400);
    expect(fieldsOf(save.body)).toEqual([`inputs.${key}.unit`]);

    const bell = await ctx.request(
      'POST',
      `/api/sheets/${(await ctx.db.selectFrom('sheets').select('id').executeTakeFirstOrThrow()).id}/revisions`,
      {
        as: 'engineer',
        body: { changeNote: 'ring \u0007 bell' },
      },
    );
    expect(bell.status).toBe(400);
    expect(bell.body.error.fields).toEqual([
      { path: 'changeNote', message: 'must not contain control characters' },
    ]);
  });

  it('refuses a title of zero-width spaces', async () => {
    const res = await ctx.request('POST', '/api/sheets', {
      as: 'engineer',
      body: {
        title: '\u200b\u200b\u200b\u200b',
        positionId: reg.positionId,
        sheetType: 'hoist-shoe-brake',
      },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toContainEqual({
      path: 'title',
      message: 'must contain visible characters',
    });
  });

  it('strips bidi controls from file names and names stored files by their sniffed type', async () => {
    const spoof = await upload(ctx, revisionId, Buffer.from('just text\n'), 'photo\u202Egnp.exe');
    expect(spoof.status).toBe(201);
    expect(spoof.body.fileName).toBe('photognp.exe.txt');
    const html = await upload(ctx, revisionId, Buffer.from('<b>hi</b>\n'), 'report.html');
    expect(html.status).toBe(201);
    expect(html.body).toMatchObject({ fileName: 'report.html.txt', contentType: 'text/plain' });
  });

  it('states the real upload limit in the 413', async () => {
    const res = await upload(
      ctx,
      revisionId,
      Buffer.alloc(MAX_ATTACHMENT_BYTES + 1, 0x41),
      'a.txt',
    );
    expect(res.status).toBe(413);
    expect(res.body.error.message).toContain('limit 25 MB');
    expect(res.body.error.details).toEqual({ limitBytes: MAX_ATTACHMENT_BYTES });
  });

  it('holds each revision to its file-count and byte quota', async () => {
    for (const n of [1, 2, 3]) {
      expect((await upload(ctx, revisionId, Buffer.from(`file ${n}\n`), `n${n}.txt`)).status).toBe(
        201,
      );
    }
    const fourth = await upload(ctx, revisionId, Buffer.from('one too many\n'), 'n4.txt');
    expect(fourth.status).toBe(413);
    expect(fourth.body.error.details).toMatchObject({ maxFiles: 3, files: 3 });

    const other = (await createSheet(ctx, reg, { title: 'Second brake' })).revisions[0]!.id;
    const big = Buffer.alloc(700 * 1024, 0x41);
    expect((await upload(ctx, other, big, 'big1.txt')).status).toBe(201);
    const over = await upload(ctx, other, big, 'big2.txt');
    expect(over.status).toBe(413);
    expect(over.body.error.details).toMatchObject({ maxBytes: 1024 * 1024 });
    const rows = await ctx.db
      .selectFrom('attachments')
      .select('id')
      .where('revisionId', '=', other)
      .execute();
    expect(rows).toHaveLength(1);
  });
});
