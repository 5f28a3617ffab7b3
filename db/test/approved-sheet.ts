import type { Kysely } from 'kysely';
import type { DB } from '../src/database.js';

/**
 * One approved revision on a register position, written straight into the tables (the demo
 * scenario is the server's: db's tests make the little they need). Authored by one demo user
 * and approved by another, as the four-eyes constraint insists. Needs the demo users.
 */
export async function insertApprovedSheet(db: Kysely<DB>): Promise<{ revisionId: string }> {
  const [author, checker] = await db
    .selectFrom('users')
    .select('id')
    .orderBy('email')
    .limit(2)
    .execute();
  if (!author || !checker) throw new Error('insertApprovedSheet needs two users');
  const site = await db
    .insertInto('sites')
    .values({ code: 'TST', name: 'Test works (invented)' })
    .returning('id')
    .executeTakeFirstOrThrow();
  const machine = await db
    .insertInto('machines')
    .values({ siteId: site.id, tag: 'M-1', name: 'Test crane', kind: 'crane' })
    .returning('id')
    .executeTakeFirstOrThrow();
  const position = await db
    .insertInto('brakePositions')
    .values({ machineId: machine.id, tag: 'B-1', description: 'Test brake', motion: 'hoist' })
    .returning('id')
    .executeTakeFirstOrThrow();
  await db
    .insertInto('criteriaSets')
    .values({ id: 'test-set', name: 'Test set', description: 'For db tests.' })
    .execute();
  await db
    .insertInto('criteriaSetVersions')
    .values({ criteriaSetId: 'test-set', version: 1, values: JSON.stringify({}) })
    .execute();
  const sheet = await db
    .insertInto('sheets')
    .values({
      documentNumber: 'HF-TST-0001',
      title: 'Test sheet',
      positionId: position.id,
      machineId: machine.id,
      siteId: site.id,
      tags: 'M-1 B-1',
      sheetType: 'hoist-shoe-brake',
      ownerId: author.id,
      criteriaSetId: 'test-set',
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  const rev = await db
    .insertInto('revisions')
    .values({
      sheetId: sheet.id,
      seq: 1,
      label: 'A',
      state: 'in_check',
      inputs: JSON.stringify({}),
      unitSystem: 'SI',
      criteriaSetId: 'test-set',
      criteriaSetVersion: 1,
      evaluation: JSON.stringify({ pass: true, results: [], checks: [] }),
      coreVersion: '0.0.0',
      hash: '0'.repeat(64),
      verificationCode: 'TESTCODE00',
      authorId: author.id,
      changeNote: 'First issue.',
      submittedAt: new Date(),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  await db
    .updateTable('revisions')
    .set({ state: 'approved', checkerId: checker.id, approvedAt: new Date() })
    .where('id', '=', rev.id)
    .execute();
  return { revisionId: rev.id };
}
