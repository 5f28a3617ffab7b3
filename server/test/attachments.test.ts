import { createHash } from 'node:crypto';
import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { ObjectStorage } from '../src/storage/object-storage.js';
import {
  createSheet,
  createSheetsContext,
  makeRegister,
  submit,
  type SheetsContext,
} from './sheets-fixture.js';
import type { DemoLogin } from './test-context.js';

const PDF = Buffer.from(
  '%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n',
);

async function upload(
  ctx: SheetsContext,
  revisionId: string,
  bytes: Buffer,
  name: string,
  as: DemoLogin = 'engineer',
) {
  const form = new FormData();
  form.append('file', new Blob([new Uint8Array(bytes)]), name);
  const res = await fetch(`${ctx.baseUrl}/api/revisions/${revisionId}/attachments`, {
    method: 'POST',
    headers: { authorization: `Bearer ${await ctx.token(as)}` },
    body: form,
  });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : undefined };
}

describe('attachments', () => {
  let ctx: SheetsContext;
  let revisionId: string;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(async () => {
    await ctx.resetAll();
    const reg = await makeRegister(ctx);
    revisionId = (await createSheet(ctx, reg)).revisions[0].id;
  });
  afterAll(() => ctx?.closeAll());

  it('stores a PDF with its SHA-256 and gives it back with Content-Disposition', async () => {
    const res = await upload(ctx, revisionId, PDF, 'Thruster data sheet Ø200.pdf');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({
      fileName: 'Thruster data sheet Ø200.pdf',
      contentType: 'application/pdf',
      size: PDF.length,
      sha256: createHash('sha256').update(PDF).digest('hex'),
      uploadedBy: { displayName: 'Erin Vale' },
    });
    const list = await ctx.request('GET', `/api/revisions/${revisionId}/attachments`, {
      as: 'engineer2',
    });
    expect(list.body.items).toHaveLength(1);
    const dl = await fetch(`${ctx.baseUrl}/api/attachments/${res.body.id}/download`, {
      headers: { authorization: `Bearer ${await ctx.token('checker')}` },
    });
    expect(dl.status).toBe(200);
    expect(dl.headers.get('content-type')).toBe('application/pdf');
    expect(dl.headers.get('content-disposition')).toBe(
      `attachment; filename="Thruster data sheet _200.pdf"; filename*=UTF-8''Thruster%20data%20sheet%20%C3%98200.pdf`,
    );
    expect(Buffer.from(await dl.arrayBuffer()).equals(PDF)).toBe(true);
  });

  it('judges the type by content: a renamed executable is 415, text named .csv is CSV', async () => {
    const exe = await upload(
      ctx,
      revisionId,
      Buffer.from([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00]),
      'data.pdf',
    );
    expect(exe.status).toBe(415);
    expect(exe.body.error.code).toBe('unsupported_media_type');
    const zip = await upload(
      ctx,
      revisionId,
      Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]),
      'table.csv',
    );
    expect(zip.status).toBe(415);
    const csv = await upload(ctx, revisionId, Buffer.from('stop,time_s\n1,0.42\n'), 'stops.csv');
    expect(csv.status).toBe(201);
    expect(csv.body.contentType).toBe('text/csv');
    const png = await upload(
      ctx,
      revisionId,
      Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0]),
      'photo.txt',
    );
    expect(png.body.contentType).toBe('image/png');
    const rows = await ctx.db.selectFrom('attachments').select('fileName').execute();
    // The stored name ends in the sniffed type's extension, so it never opens as text.
    expect(rows.map((r) => r.fileName).sort()).toEqual(['photo.txt.png', 'stops.csv']);
  });

  it('sanitises path traversal and control characters in names', async () => {
    const res = await upload(ctx, revisionId, Buffer.from('notes'), '../../etc/pass\twd.txt');
    expect(res.status).toBe(201);
    expect(res.body.fileName).toBe('passwd.txt');
    const win = await upload(ctx, revisionId, Buffer.from('notes'), '..\\..\\boot.ini');
    expect(win.body.fileName).toBe('boot.ini.txt');
    const dots = await upload(ctx, revisionId, Buffer.from('notes'), '...notes.txt');
    expect(dots.body.fileName).toBe('notes.txt');
    // A raw control character breaks the multipart header itself: a clean 400, nothing stored.
    const bell = await upload(ctx, revisionId, Buffer.from('notes'), 'bell\u0007.txt');
    expect(bell.status).toBe(400);
    expect(await ctx.db.selectFrom('attachments').selectAll().execute()).toHaveLength(3);
  });

  it('refuses files over 25 MB with 413 and keeps no record', async () => {
    const big = Buffer.alloc(25 * 1024 * 1024 + 1, 0x41);
    const res = await upload(ctx, revisionId, big, 'big.txt');
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
    expect(await ctx.db.selectFrom('attachments').selectAll().execute()).toHaveLength(0);
  });

  it('refuses uploads by other people, viewers, and to frozen revisions', async () => {
    expect((await upload(ctx, revisionId, PDF, 'a.pdf', 'engineer2')).status).toBe(403);
    expect((await upload(ctx, revisionId, PDF, 'a.pdf', 'viewer')).status).toBe(403);
    await submit(ctx, revisionId);
    expect((await upload(ctx, revisionId, PDF, 'a.pdf')).status).toBe(409);
  });

  it('removes the stored object again when the database row cannot be written', async () => {
    const { readdirSync, existsSync } = await import('node:fs');
    const path = await import('node:path');
    const storage = ctx.app.get(ObjectStorage);
    const dir = path.join(storage.settings.directory, storage.settings.S3_BUCKET);
    const objects = () => {
      const walk = (d: string): string[] =>
        existsSync(d)
          ? readdirSync(d, { withFileTypes: true }).flatMap((e) =>
              e.isDirectory() ? walk(path.join(d, e.name)) : [e.name],
            )
          : [];
      return walk(dir).filter(
        (n) =>
          !n.startsWith('.') &&
          !n.endsWith('._S3rver_metadata.json') &&
          !n.endsWith('._S3rver_object.md5'),
      );
    };
    const before = objects().length;
    await sql`create function refuse_attachment() returns trigger language plpgsql as $$
      begin raise exception 'simulated database failure'; end $$`.execute(ctx.db);
    await sql`create trigger refuse_attachment before insert on attachments for each row execute function refuse_attachment()`.execute(
      ctx.db,
    );
    try {
      const res = await upload(ctx, revisionId, PDF, 'a.pdf');
      expect(res.status).toBe(500);
    } finally {
      await sql`drop trigger refuse_attachment on attachments`.execute(ctx.db);
      await sql`drop function refuse_attachment()`.execute(ctx.db);
    }
    expect(await ctx.db.selectFrom('attachments').selectAll().execute()).toHaveLength(0);
    expect(objects().length).toBe(before);
    // And a good upload afterwards does add one object.
    expect((await upload(ctx, revisionId, PDF, 'a.pdf')).status).toBe(201);
    expect(objects().length).toBeGreaterThan(before);
  });

  it('answers 500 with a clear reason when stored bytes no longer match their SHA-256', async () => {
    const res = await upload(ctx, revisionId, PDF, 'a.pdf');
    const row = await ctx.db
      .selectFrom('attachments')
      .select('storageKey')
      .executeTakeFirstOrThrow();
    await ctx.app
      .get(ObjectStorage)
      .put(row.storageKey, Buffer.from('%PDF-tampered'), 'application/pdf');
    const dl = await ctx.request('GET', `/api/attachments/${res.body.id}/download`, {
      as: 'engineer',
    });
    expect(dl.status).toBe(500);
    expect(dl.body.error.details.reason).toBe('checksum_mismatch');
  });
});

describe('attachments with the storage down', () => {
  let ctx: SheetsContext;
  beforeAll(async () => {
    // Port 9 (discard) on loopback: nothing listens there.
    ctx = await createSheetsContext({
      S3_EMBEDDED: '0',
      S3_ENDPOINT: 'http://127.0.0.1:9',
      S3_TIMEOUT_MS: '1000',
    });
    await ctx.resetAll();
  });
  afterAll(() => ctx?.closeAll());

  it('gives 503 service_unavailable and leaves no half record', async () => {
    const reg = await makeRegister(ctx, 'DWN');
    const revisionId = (await createSheet(ctx, reg)).revisions[0].id;
    const res = await upload(ctx, revisionId, PDF, 'a.pdf');
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('service_unavailable');
    expect(await ctx.db.selectFrom('attachments').selectAll().execute()).toHaveLength(0);
  });
});
