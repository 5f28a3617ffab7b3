import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { AuditRepository } from '../src/audit/audit.repository.js';
import { UnitOfWork } from '../src/database/unit-of-work.js';
import { SignedInUsers } from '../src/users/signed-in-users.js';
import { UsersRepository } from '../src/users/users.repository.js';
import { VerifyRepository } from '../src/verify/verify.repository.js';
import { WorkQueueRepository } from '../src/work-queue/work-queue.repository.js';
import { createTestContext, demoEmail, type TestContext } from './test-context.js';

/** Repositories on the real, migrated database: what each query returns and leaves out. */
describe('repositories', () => {
  let ctx: TestContext;
  let users: UsersRepository;
  beforeAll(async () => {
    ctx = await createTestContext();
    users = ctx.app.get(UsersRepository);
  });
  beforeEach(() => ctx.reset());
  afterAll(() => ctx?.close());

  it('UsersRepository: people by id, once each; unknown and empty ids left out', async () => {
    const [engineer, checker] = [await ctx.userId('engineer'), await ctx.userId('checker')];
    const people = await users.people([engineer, checker, engineer, null, undefined]);
    expect([...people.keys()].sort()).toEqual([engineer, checker].sort());
    expect(people.get(engineer)).toEqual({
      id: engineer,
      displayName: 'Erin Vale',
      initials: 'EV',
    });
    expect((await users.people([])).size).toBe(0);
    expect((await users.people(['00000000-0000-4000-8000-000000000000'])).size).toBe(0);
  });

  it('UsersRepository: e-mail only to active users, sorted; checkers other than the author', async () => {
    const ids = await Promise.all(
      (['viewer', 'engineer', 'checker2'] as const).map((w) => ctx.userId(w)),
    );
    expect(await users.activeEmails([...ids, null])).toEqual([
      demoEmail('checker2'),
      demoEmail('engineer'),
      demoEmail('viewer'),
    ]);
    await users.update(ids[1]!, { active: false });
    expect(await users.activeEmails(ids)).toEqual([demoEmail('checker2'), demoEmail('viewer')]);
    expect(await users.activeEmails([])).toEqual([]);
    const checker = await ctx.userId('checker');
    expect(await users.checkerEmails(checker)).toEqual([demoEmail('checker2')]);
  });

  it('VerifyRepository and WorkQueueRepository answer nothing for what does not exist', async () => {
    const verify = ctx.app.get(VerifyRepository);
    expect(await verify.byCode('NO-SUCH-CODE')).toBeUndefined();
    expect(await verify.openReview('00000000-0000-4000-8000-000000000000')).toBeUndefined();
    const queue = ctx.app.get(WorkQueueRepository);
    const engineer = await ctx.userId('engineer');
    expect(await queue.drafts(engineer)).toEqual([]);
    expect(await queue.awaitingCheckBy(engineer)).toEqual([]);
    expect(await queue.recentlyApproved()).toEqual([]);
  });

  it('UnitOfWork: what a repository writes with its Tx commits with it, or rolls back with it', async () => {
    const units = ctx.app.get(UnitOfWork);
    const audit = ctx.app.get(AuditRepository);
    const row = (action: string) => ({
      actorId: null,
      action,
      entity: 'register',
      entityId: '00000000-0000-4000-8000-00000000beef',
      sheetId: null,
      before: null,
      after: null,
    });
    const count = async (action: string) =>
      (await ctx.db.selectFrom('auditEvents').select('id').where('action', '=', action).execute())
        .length;
    await units.run((tx) => audit.append(row('test.committed'), tx));
    await expect(
      units.run(async (tx) => {
        await audit.append(row('test.rolled-back'), tx);
        throw new Error('abandoned');
      }),
    ).rejects.toThrow('abandoned');
    expect(await count('test.committed')).toBe(1);
    expect(await count('test.rolled-back')).toBe(0);
  });

  it('SignedInUsers keeps no row read across a change, and none while not listening', async () => {
    const signedIn = ctx.app.get(SignedInUsers);
    const engineer = await ctx.userId('engineer');
    const row = (await users.findById(engineer))!;
    const ticket = signedIn.ticket();
    signedIn.forget(engineer); // a change came in while the row was being read
    signedIn.keep(row, ticket);
    expect(signedIn.get(engineer)).toBeUndefined();
    // Wait until the listening connection is up (it starts with the app), then a row is kept.
    for (const t = Date.now(); !signedIn.ticket().listening && Date.now() - t < 5000;)
      await new Promise((r) => setTimeout(r, 20));
    signedIn.keep(row, signedIn.ticket());
    expect(signedIn.get(engineer)).toEqual(row);
    await users.endAccessTokens(engineer);
    expect(signedIn.get(engineer)).toBeUndefined();
  });
});
