import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { AttachmentsRepository } from '../src/attachments/attachments.repository.js';
import { PasswordResetsRepository } from '../src/auth/password-resets.repository.js';
import { CommentsRepository } from '../src/comments/comments.repository.js';
import { CriteriaRepository } from '../src/criteria/criteria.repository.js';
import { UnitOfWork } from '../src/database/unit-of-work.js';
import { HealthRepository } from '../src/health/health.repository.js';
import { OutboxRepository } from '../src/outbox/outbox.repository.js';
import { ReviewsRepository } from '../src/reviews/reviews.repository.js';
import {
  createSheet,
  createSheetsContext,
  makeRegister,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

const NO_SUCH_ID = '00000000-0000-4000-8000-000000000000';

/**
 * The repositories of files, comments, mail, password resets, criteria locks and the health
 * check on the real, migrated database: what each query returns and leaves out.
 */
describe('repositories of records around a revision', () => {
  let ctx: SheetsContext;
  let reg: Register;
  let units: UnitOfWork;
  beforeAll(async () => {
    ctx = await createSheetsContext();
    units = ctx.app.get(UnitOfWork);
  });
  beforeEach(async () => {
    await ctx.resetAll();
    reg = await makeRegister(ctx);
  });
  afterAll(() => ctx?.closeAll());

  /** Two sheets' first revisions. */
  async function twoRevisions() {
    const a = await createSheet(ctx, reg, { title: 'First', confirm: false });
    const b = await createSheet(ctx, reg, { title: 'Second', confirm: false });
    return { a, b, revA: a.revisions[0]!.id, revB: b.revisions[0]!.id };
  }

  it('HealthRepository: ping resolves while the database answers', async () => {
    await expect(ctx.app.get(HealthRepository).ping()).resolves.toBeUndefined();
  });

  it('AttachmentsRepository: a revision lists its own files, oldest first; usage counts them', async () => {
    const repo = ctx.app.get(AttachmentsRepository);
    const { a, b, revA, revB } = await twoRevisions();
    const engineer = await ctx.userId('engineer');
    const file = (revisionId: string, fileName: string, size: number) => ({
      revisionId,
      fileName,
      contentType: 'text/plain',
      size,
      sha256: 'a'.repeat(64),
      storageKey: `revisions/${revisionId}/${fileName}`,
      uploadedBy: engineer,
    });
    expect(await repo.usage(revA)).toEqual({ files: 0, bytes: 0 });
    const first = await units.run(async (tx) => {
      await repo.lockRevision(revA, tx);
      return repo.insert(file(revA, 'one.txt', 100), tx);
    });
    await repo.insert(file(revA, 'two.txt', 50));
    await repo.insert(file(revB, 'other.txt', 7));
    expect((await repo.listForRevision(revA)).map((r) => r.fileName)).toEqual([
      'one.txt',
      'two.txt',
    ]);
    expect(await repo.usage(revA)).toEqual({ files: 2, bytes: 150 });
    expect((await repo.find(first.id))?.storageKey).toBe(`revisions/${revA}/one.txt`);
    expect(await repo.find(NO_SUCH_ID)).toBeUndefined();
    expect(await repo.listForRevision(NO_SUCH_ID)).toEqual([]);
    // The demo's data sheet goes only to latest revisions without a file, of the named documents.
    const c = await createSheet(ctx, reg, { title: 'Third', confirm: false });
    const targets = await repo.withoutFiles([a.documentNumber, b.documentNumber, c.documentNumber]);
    expect(targets).toEqual([
      { documentNumber: c.documentNumber, revisionId: c.revisions[0]!.id, authorId: engineer },
    ]);
    expect(await repo.withoutFiles(['NO-SUCH-DOC'])).toEqual([]);
  });

  it('CommentsRepository: oldest first per revision; resolving names who and when, reopening clears it', async () => {
    const repo = ctx.app.get(CommentsRepository);
    const { revA, revB } = await twoRevisions();
    const [engineer, checker] = [await ctx.userId('engineer'), await ctx.userId('checker')];
    const comment = (revisionId: string, body: string, parentId: string | null = null) => ({
      revisionId,
      parentId,
      authorId: engineer,
      body,
      anchorKind: parentId ? null : 'input',
      anchorKey: parentId ? null : 'drumDiameter',
    });
    const top = await repo.insert(comment(revA, 'First'));
    await units.run((tx) => repo.insert(comment(revA, 'Reply', top.id), tx));
    await repo.insert(comment(revB, 'Elsewhere'));
    const listed = await repo.listForRevision(revA);
    expect(listed.map((c) => [c.body, c.parentId])).toEqual([
      ['First', null],
      ['Reply', top.id],
    ]);
    expect(await repo.find(NO_SUCH_ID)).toBeUndefined();
    const resolved = await units.run(async (tx) => {
      expect((await repo.find(top.id, tx, true))?.body).toBe('First');
      return repo.setResolved(top.id, true, checker, tx);
    });
    expect(resolved).toMatchObject({ resolved: true, resolvedBy: checker });
    expect(resolved.resolvedAt).toBeInstanceOf(Date);
    const reopened = await repo.setResolved(top.id, false, checker);
    expect(reopened).toMatchObject({ resolved: false, resolvedBy: null, resolvedAt: null });
  });

  it('OutboxRepository: failed lists only unsent rows past the limit, newest first; reset works once', async () => {
    const repo = ctx.app.get(OutboxRepository);
    const mail = (subject: string) =>
      JSON.stringify({ to: ['a@holdfast.test'], subject, text: 'x' });
    const ids: string[] = [];
    for (const subject of ['older', 'newer', 'young', 'sent'])
      ids.push(await units.run((tx) => repo.insertMail(mail(subject), tx)));
    const [olderId, newerId, youngId, sentId] = ids as [string, string, string, string];
    // Three failed attempts each; the limit is 2 (more than 2 failures is "failed for good").
    for (const id of [olderId, newerId, sentId])
      for (let i = 0; i < 3; i++) await repo.recordFailure(id, `attempt ${i}`);
    await repo.recordFailure(youngId, 'once');
    await repo.recordSent(sentId);
    // Each row was inserted in its own transaction, so created_at orders them.
    const failed = await repo.failed(2);
    expect(failed.map((r) => r.id)).toEqual([newerId, olderId]);
    expect(failed[0]).toMatchObject({ attempts: 3, lastError: 'attempt 2', sentAt: null });
    expect(await repo.failed(3)).toEqual([]);
    expect(await units.run((tx) => repo.resetFailed(newerId, 2, tx))).toBe(true);
    expect(await repo.find(newerId)).toMatchObject({ attempts: 0, lastError: null });
    expect(await repo.resetFailed(newerId, 2)).toBe(false);
    expect(await repo.resetFailed(sentId, 2)).toBe(false);
    expect(await repo.resetFailed(NO_SUCH_ID, 2)).toBe(false);
    const delivered = await repo.find(sentId);
    expect(delivered).toMatchObject({ attempts: 4, lastError: null });
    expect(delivered?.sentAt).toBeInstanceOf(Date);
    expect(delivered?.payload).toMatchObject({ subject: 'sent', text: 'x' });
    await repo.recordSent(youngId, JSON.stringify({ to: [], subject: 'young', text: 'blanked' }));
    expect((await repo.find(youngId))?.payload).toMatchObject({ text: 'blanked' });
    expect(await repo.find(NO_SUCH_ID)).toBeUndefined();
  });

  it('PasswordResetsRepository: a new link closes the open ones of that user only; used once', async () => {
    const repo = ctx.app.get(PasswordResetsRepository);
    const [admin, engineer, viewer] = await Promise.all(
      (['admin', 'engineer', 'viewer'] as const).map((w) => ctx.userId(w)),
    );
    const link = (userId: string, tokenHash: string) => ({
      userId,
      tokenHash,
      requestedBy: admin,
      expiresAt: new Date(Date.now() + 3600_000),
    });
    await repo.insert(link(engineer, 'e1'));
    await repo.insert(link(viewer, 'v1'));
    await units.run(async (tx) => {
      await repo.closeOpen(engineer, tx);
      await repo.insert(link(engineer, 'e2'), tx);
    });
    expect((await repo.findByHash('e1'))?.usedAt).toBeInstanceOf(Date);
    expect((await repo.findByHash('v1'))?.usedAt).toBeNull();
    const fresh = (await repo.findByHash('e2'))!;
    expect(fresh).toMatchObject({ userId: engineer, requestedBy: admin, usedAt: null });
    expect(await repo.findByHash('nothing')).toBeUndefined();
    expect(await units.run((tx) => repo.markUsed(fresh.id, tx))).toBe(true);
    expect(await repo.markUsed(fresh.id)).toBe(false);
  });

  it('CriteriaRepository: a set exists and locks by its id; an unknown id neither', async () => {
    const repo = ctx.app.get(CriteriaRepository);
    const [shipped] = await repo.listWithLatest();
    expect(shipped).toBeDefined();
    expect(await repo.setExists(shipped!.id)).toBe(true);
    expect(await repo.setExists('no-such-set')).toBe(false);
    expect(await units.run((tx) => repo.lockSet(shipped!.id, tx))).toBe(true);
    expect(await units.run((tx) => repo.lockSet('no-such-set', tx))).toBe(false);
  });

  it('ReviewsRepository: revisionAccess gives what the read rules need, nothing for an unknown id', async () => {
    const repo = ctx.app.get(ReviewsRepository);
    const { a, revA } = await twoRevisions();
    const engineer = await ctx.userId('engineer');
    const rev = await repo.revisionAccess(revA);
    expect(rev).toMatchObject({ id: revA, sheetId: a.id, state: 'draft', authorId: engineer });
    expect(Object.keys(rev!).sort()).toEqual(
      ['authorId', 'editorIds', 'id', 'label', 'sheetId', 'state', 'submitterIds'].sort(),
    );
    expect(await repo.revisionAccess(NO_SUCH_ID)).toBeUndefined();
  });
});
