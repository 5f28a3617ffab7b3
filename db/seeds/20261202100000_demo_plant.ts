import type { Kysely } from 'kysely';
import type { CriteriaSet, SheetInputs, SheetTypeDefinition } from '@holdfast/calc';
import type { DB } from '../src/database.js';
import {
  contentHash,
  coreVersion,
  defaults,
  evaluate,
  resolvedInputs,
  sheetType,
  shippedCriteriaSets,
  vary,
  verificationCode,
} from './demo-plant/calc-access.js';
import {
  demoMachines,
  demoSheets,
  demoSite,
  type DemoRevision,
  type DemoSheet,
} from './demo-plant/plant.js';

const DAY = 24 * 3600 * 1000;
const LABELS = 'ABCDEFGHIJ';

/** The shipped criteria sets as version 1 (the server does the same on start; both idempotent). */
async function ensureCriteriaSets(db: Kysely<DB>, sets: CriteriaSet[]): Promise<void> {
  for (const set of sets) {
    const inserted = await db
      .insertInto('criteriaSets')
      .values({ id: set.id, name: set.name, description: set.description })
      .onConflict((oc) => oc.column('id').doNothing())
      .returning('id')
      .executeTakeFirst();
    if (inserted) {
      await db
        .insertInto('criteriaSetVersions')
        .values({
          criteriaSetId: set.id,
          version: 1,
          values: JSON.stringify(set.values),
          note: 'Shipped with the calculation core.',
        })
        .execute();
    }
  }
}

function defaultSet(sets: CriteriaSet[], type: string): CriteriaSet {
  const prefer = type.startsWith('hoist')
    ? 'hoist'
    : type.startsWith('travel')
      ? 'travel'
      : 'general';
  return sets.find((s) => s.id.includes(prefer)) ?? sets[0];
}

/**
 * The invented demo plant: register, nine sheets across every state and sheet type, comments
 * (a returned revision with its comments answered), and an approved sheet with a superseded
 * predecessor. Every evaluation comes from the calc core. Runs once: skipped when the NRW site
 * exists. The demo attachment is added by the server on start (it needs the object storage).
 */
export async function seed(db: Kysely<DB>): Promise<void> {
  const types = [...new Set(demoSheets.map((s) => s.sheetType))];
  const missing = types.filter((t) => !sheetType(t));
  const sets = shippedCriteriaSets();
  if (missing.length > 0 || sets.length === 0) {
    console.warn(
      `demo plant skipped: the calc core does not yet provide ${missing.join(', ') || 'criteria sets'}`,
    );
    return;
  }
  await db.transaction().execute(async (trx) => {
    const exists = await trx
      .selectFrom('sites')
      .select('id')
      .where('code', '=', demoSite.code)
      .executeTakeFirst();
    if (exists) return;
    await ensureCriteriaSets(trx, sets);
    const users = new Map(
      (await trx.selectFrom('users').select(['id', 'email']).execute()).map((u) => [u.email, u.id]),
    );
    const user = (email: string) => {
      const id = users.get(email);
      if (!id) throw new Error(`demo plant needs the demo user ${email}`);
      return id;
    };
    const site = await trx
      .insertInto('sites')
      .values(demoSite)
      .returning('id')
      .executeTakeFirstOrThrow();
    const positions = new Map<string, { id: string; machineId: string; tags: string }>();
    for (const m of demoMachines) {
      const machine = await trx
        .insertInto('machines')
        .values({ siteId: site.id, tag: m.tag, name: m.name, kind: m.kind })
        .returning('id')
        .executeTakeFirstOrThrow();
      for (const p of m.positions) {
        const row = await trx
          .insertInto('brakePositions')
          .values({
            machineId: machine.id,
            tag: p.tag,
            description: p.description,
            motion: p.motion,
          })
          .returning('id')
          .executeTakeFirstOrThrow();
        positions.set(`${m.tag}/${p.tag}`, {
          id: row.id,
          machineId: machine.id,
          tags: `${m.tag} ${p.tag}`,
        });
      }
    }
    let number = 0;
    for (const sheet of demoSheets) {
      number += 1;
      await seedSheet(
        trx,
        sheet,
        `HF-${demoSite.code}-${String(number).padStart(4, '0')}`,
        site.id,
        positions,
        sets,
        user,
      );
    }
    await trx
      .updateTable('sites')
      .set({ nextSheetNumber: number + 1 })
      .where('id', '=', site.id)
      .execute();
  });
}

async function seedSheet(
  trx: Kysely<DB>,
  sheet: DemoSheet,
  documentNumber: string,
  siteId: string,
  positions: Map<string, { id: string; machineId: string; tags: string }>,
  sets: CriteriaSet[],
  user: (email: string) => string,
): Promise<void> {
  const def = sheetType(sheet.sheetType)!;
  const criteria = defaultSet(sets, sheet.sheetType);
  const position = positions.get(`${sheet.machine}/${sheet.position}`)!;
  const created = new Date(Date.now() - sheet.revisions[0].daysAgo * DAY);
  const row = await trx
    .insertInto('sheets')
    .values({
      documentNumber,
      title: sheet.title,
      positionId: position.id,
      machineId: position.machineId,
      siteId,
      tags: position.tags,
      sheetType: sheet.sheetType,
      ownerId: user(sheet.owner),
      criteriaSetId: criteria.id,
      createdAt: created,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  await audit(trx, user(sheet.owner), 'sheet.created', 'sheet', row.id, row.id, created, null, {
    documentNumber,
    title: sheet.title,
  });

  let inputs = defaults(def);
  let previousApproved: string | undefined;
  for (const [i, r] of sheet.revisions.entries()) {
    if (r.vary) inputs = vary(def, inputs, r.vary[0], r.vary[1]);
    inputs = entered(def, inputs, r);
    const at = new Date(Date.now() - r.daysAgo * DAY);
    const frozen = r.state !== 'draft';
    // A frozen record keeps the inputs as the core used them beside its results, as the API does.
    const evaluation = frozen
      ? { ...evaluate(def, inputs, criteria), resolvedInputs: resolvedInputs(def, inputs) }
      : evaluate(def, inputs, criteria);
    const hash = frozen ? contentHash(inputs, evaluation) : null;
    const justification =
      frozen && !evaluation.pass
        ? (r.justification ??
          'Demo: the failing checks are accepted for a limited period pending new linings (invented scenario).')
        : null;
    // Approved ones are inserted in check, then approved by UPDATE, as the database allows.
    const insertState = r.state === 'approved' || r.state === 'superseded' ? 'in_check' : r.state;
    const rev = await trx
      .insertInto('revisions')
      .values({
        sheetId: row.id,
        seq: i + 1,
        label: LABELS[i],
        state: insertState,
        inputs: JSON.stringify(inputs),
        unitSystem: 'SI',
        criteriaSetId: criteria.id,
        criteriaSetVersion: 1,
        evaluation: JSON.stringify(evaluation),
        coreVersion: coreVersion(),
        hash,
        verificationCode: hash ? verificationCode(hash) : null,
        authorId: user(r.author),
        checkerId: r.state === 'returned' ? user(r.checker!) : null,
        changeNote: r.changeNote,
        justification,
        createdAt: at,
        submittedAt: frozen ? at : null,
        returnedAt: r.state === 'returned' ? at : null,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    if (frozen)
      await audit(
        trx,
        user(r.author),
        'revision.submitted',
        'revision',
        rev.id,
        row.id,
        at,
        { state: 'draft' },
        { state: 'in_check', hash },
      );
    if (r.state === 'approved' || r.state === 'superseded') {
      if (previousApproved) {
        await trx
          .updateTable('revisions')
          .set({ state: 'superseded', supersededAt: at, supersededById: rev.id })
          .where('id', '=', previousApproved)
          .execute();
        await audit(
          trx,
          user(r.checker!),
          'revision.superseded',
          'revision',
          previousApproved,
          row.id,
          at,
          { state: 'approved' },
          { state: 'superseded' },
        );
      }
      await trx
        .updateTable('revisions')
        .set({ state: 'approved', checkerId: user(r.checker!), approvedAt: at })
        .where('id', '=', rev.id)
        .execute();
      await audit(
        trx,
        user(r.checker!),
        'revision.approved',
        'revision',
        rev.id,
        row.id,
        at,
        { state: 'in_check' },
        { state: 'approved', hash },
      );
      previousApproved = rev.id;
    }
    if (r.state === 'returned') {
      await audit(
        trx,
        user(r.checker!),
        'revision.returned',
        'revision',
        rev.id,
        row.id,
        at,
        { state: 'in_check' },
        { state: 'returned' },
      );
    }
    for (const c of r.comments ?? []) {
      const anchorKey =
        c.anchor?.key === 'first-input'
          ? def.fields[0]?.key
          : c.anchor?.key === 'first-check'
            ? evaluation.checks[0]?.id
            : undefined;
      const comment = await trx
        .insertInto('comments')
        .values({
          revisionId: rev.id,
          authorId: user(c.by),
          body: c.body,
          anchorKind: anchorKey ? c.anchor!.kind : null,
          anchorKey: anchorKey ?? null,
          resolved: c.resolved ?? false,
          resolvedBy: c.resolved ? user(r.author) : null,
          resolvedAt: c.resolved ? at : null,
          createdAt: at,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      if (c.reply) {
        await trx
          .insertInto('comments')
          .values({
            revisionId: rev.id,
            parentId: comment.id,
            authorId: user(c.reply.by),
            body: c.reply.body,
            createdAt: at,
          })
          .execute();
      }
    }
  }
}

/** The inputs of a revision: the previous ones with this revision's entries. */
function entered(def: SheetTypeDefinition, previous: SheetInputs, r: DemoRevision): SheetInputs {
  const inputs = structuredClone(previous);
  for (const [key, value] of r.set ?? []) inputs[key] = structuredClone(value);
  const demo = defaults(def);
  for (const key of r.demoValues ?? []) if (key in demo) inputs[key] = structuredClone(demo[key]);
  for (const key of r.leaveOut ?? []) delete inputs[key];
  return inputs;
}

async function audit(
  trx: Kysely<DB>,
  actorId: string,
  action: string,
  entity: string,
  entityId: string,
  sheetId: string,
  at: Date,
  before: unknown,
  after: unknown,
): Promise<void> {
  await trx
    .insertInto('auditEvents')
    .values({
      actorId,
      action,
      entity,
      entityId,
      sheetId,
      at,
      before: before === null ? null : JSON.stringify(before),
      after: JSON.stringify(after),
    })
    .execute();
}
