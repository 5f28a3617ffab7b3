import { Injectable } from '@nestjs/common';
import type { CriteriaSet, CriterionValue } from '@holdfast/calc';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

export interface CriteriaVersionRow {
  criteriaSetId: string;
  version: number;
  values: CriterionValue[];
  note: string | null;
  publishedBy: string | null;
  publishedAt: Date;
}

@Injectable()
export class CriteriaRepository {
  constructor(private readonly db: Database) {}

  /** Insert a shipped set as version 1 unless the set already exists (idempotent). */
  async ensureShipped(set: CriteriaSet): Promise<void> {
    await this.db.transaction().execute(async (trx) => {
      const inserted = await trx
        .insertInto('criteriaSets')
        .values({ id: set.id, name: set.name, description: set.description })
        .onConflict((oc) => oc.column('id').doNothing())
        .returning('id')
        .executeTakeFirst();
      if (!inserted) return;
      await trx
        .insertInto('criteriaSetVersions')
        .values({
          criteriaSetId: set.id,
          version: 1,
          values: JSON.stringify(set.values),
          note: `Shipped with the calculation core (set version ${set.version}).`,
        })
        .execute();
    });
  }

  listWithLatest() {
    return this.db
      .selectFrom('criteriaSets as s')
      .innerJoin('criteriaSetVersions as v', 'v.criteriaSetId', 's.id')
      .select(['s.id', 's.name', 's.description', 'v.version', 'v.publishedAt'])
      .where(({ eb, selectFrom }) =>
        eb(
          'v.version',
          '=',
          selectFrom('criteriaSetVersions as x')
            .select((e) => e.fn.max('x.version').as('m'))
            .whereRef('x.criteriaSetId', '=', 's.id'),
        ),
      )
      .orderBy('s.id')
      .execute();
  }

  findSet(id: string) {
    return this.db.selectFrom('criteriaSets').selectAll().where('id', '=', id).executeTakeFirst();
  }

  async versions(id: string, tx?: Tx): Promise<CriteriaVersionRow[]> {
    const rows = await on(this.db, tx)
      .selectFrom('criteriaSetVersions')
      .selectAll()
      .where('criteriaSetId', '=', id)
      .orderBy('version', 'asc')
      .execute();
    return rows.map((r) => ({ ...r, values: r.values as CriterionValue[] }));
  }

  async version(
    id: string,
    version: number | 'latest',
    tx?: Tx,
  ): Promise<CriteriaVersionRow | undefined> {
    let q = on(this.db, tx)
      .selectFrom('criteriaSetVersions')
      .selectAll()
      .where('criteriaSetId', '=', id);
    q =
      version === 'latest'
        ? q.orderBy('version', 'desc').limit(1)
        : q.where('version', '=', version);
    const row = await q.executeTakeFirst();
    return row ? { ...row, values: row.values as CriterionValue[] } : undefined;
  }

  /** Whether a set has this id. */
  async setExists(id: string, tx?: Tx): Promise<boolean> {
    const row = await on(this.db, tx)
      .selectFrom('criteriaSets')
      .select('id')
      .where('id', '=', id)
      .executeTakeFirst();
    return row !== undefined;
  }

  /** Takes the set's row lock (inside the caller's transaction): publishing is one at a time. */
  async lockSet(id: string, tx: Tx): Promise<boolean> {
    const row = await on(this.db, tx)
      .selectFrom('criteriaSets')
      .select('id')
      .where('id', '=', id)
      .forUpdate()
      .executeTakeFirst();
    return row !== undefined;
  }

  /** A new set with its first version (the caller audits it). */
  async createSet(
    tx: Tx,
    set: { id: string; name: string; description: string },
    values: CriterionValue[],
    note: string,
    publishedBy: string,
  ): Promise<void> {
    await on(this.db, tx).insertInto('criteriaSets').values(set).execute();
    await this.insertVersion(tx, {
      criteriaSetId: set.id,
      version: 1,
      values,
      note,
      publishedBy,
    });
  }

  /** Every confirmation of the set's values, oldest first, with who made it. */
  confirmations(id: string) {
    return this.db
      .selectFrom('criteriaConfirmations as c')
      .innerJoin('users as u', 'u.id', 'c.confirmedBy')
      .select([
        'c.key',
        'c.version',
        'c.document',
        'c.clause',
        'c.confirmedAt',
        'u.id as userId',
        'u.displayName',
        'u.initials',
      ])
      .where('c.criteriaSetId', '=', id)
      .orderBy('c.confirmedAt', 'asc')
      .execute();
  }

  async insertConfirmation(
    tx: Tx,
    row: {
      criteriaSetId: string;
      version: number;
      key: string;
      document: string;
      clause: string;
      confirmedBy: string;
    },
  ): Promise<void> {
    await on(this.db, tx).insertInto('criteriaConfirmations').values(row).execute();
  }

  async insertVersion(
    tx: Tx,
    row: {
      criteriaSetId: string;
      version: number;
      values: CriterionValue[];
      note: string;
      publishedBy: string;
    },
  ): Promise<void> {
    await on(this.db, tx)
      .insertInto('criteriaSetVersions')
      .values({ ...row, values: JSON.stringify(row.values) })
      .execute();
  }
}
