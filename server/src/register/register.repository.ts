import { Injectable } from '@nestjs/common';
import type { Insertable } from 'kysely';
import type { DB } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

/** The columns a site, machine and brake position are shown and audited with. */
export const siteColumns = ['id', 'code', 'name'] as const;
export const machineColumns = ['id', 'siteId', 'tag', 'name', 'kind'] as const;
export const positionColumns = [
  'id',
  'machineId',
  'tag',
  'description',
  'motion',
  'brakeKind',
  'thruster',
  'lining',
] as const;

/** The plant register (sites, machines, brake positions): the tree's reads and new entries. */
@Injectable()
export class RegisterRepository {
  constructor(private readonly db: Database) {}

  sites() {
    return this.db.selectFrom('sites').select(siteColumns).orderBy('code').execute();
  }

  machines() {
    return this.db.selectFrom('machines').select(machineColumns).orderBy('tag').execute();
  }

  positions() {
    return this.db.selectFrom('brakePositions').select(positionColumns).orderBy('tag').execute();
  }

  /** Every sheet's approved revision with its position, oldest approval first. */
  approvedSheets() {
    return this.db
      .selectFrom('sheets as s')
      .innerJoin('revisions as r', 'r.id', 's.approvedRevisionId')
      .select([
        's.positionId',
        's.id as sheetId',
        's.documentNumber',
        's.sheetType',
        'r.id as revisionId',
        'r.label',
        'r.approvedAt',
      ])
      .orderBy('r.approvedAt', 'asc')
      .execute();
  }

  /** Sheets with a revision still a draft, in check or returned, by document number. */
  openSheets() {
    return this.db
      .selectFrom('sheets as s')
      .innerJoin('revisions as r', 'r.sheetId', 's.id')
      .select(['s.positionId', 's.id', 's.documentNumber', 's.sheetType', 'r.label', 'r.state'])
      .where('r.state', 'in', ['draft', 'in_check', 'returned'])
      .orderBy('s.documentNumber')
      .execute();
  }

  insertSite(values: Insertable<DB['sites']>, tx: Tx) {
    return on(this.db, tx)
      .insertInto('sites')
      .values(values)
      .returning(siteColumns)
      .executeTakeFirstOrThrow();
  }

  async siteExists(id: string, tx?: Tx): Promise<boolean> {
    const row = await on(this.db, tx)
      .selectFrom('sites')
      .select('id')
      .where('id', '=', id)
      .executeTakeFirst();
    return row !== undefined;
  }

  insertMachine(values: Insertable<DB['machines']>, tx: Tx) {
    return on(this.db, tx)
      .insertInto('machines')
      .values(values)
      .returning(machineColumns)
      .executeTakeFirstOrThrow();
  }

  async machineExists(id: string, tx?: Tx): Promise<boolean> {
    const row = await on(this.db, tx)
      .selectFrom('machines')
      .select('id')
      .where('id', '=', id)
      .executeTakeFirst();
    return row !== undefined;
  }

  insertPosition(values: Insertable<DB['brakePositions']>, tx: Tx) {
    return on(this.db, tx)
      .insertInto('brakePositions')
      .values(values)
      .returning(positionColumns)
      .executeTakeFirstOrThrow();
  }
}
