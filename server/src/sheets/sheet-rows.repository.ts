import { Injectable } from '@nestjs/common';
import type { Insertable } from 'kysely';
import type { DB, SheetRow } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

export type NewSheet = Insertable<DB['sheets']>;

/**
 * Single sheet rows and what issuing a sheet reads: its position, site number and criteria set.
 * The register list and summaries are in SheetsRepository.
 */
@Injectable()
export class SheetRowsRepository {
  constructor(private readonly db: Database) {}

  /** Position with its machine and site, for creating a sheet. */
  findPosition(positionId: string, tx?: Tx) {
    return on(this.db, tx)
      .selectFrom('brakePositions as p')
      .innerJoin('machines as m', 'm.id', 'p.machineId')
      .innerJoin('sites as site', 'site.id', 'm.siteId')
      .select([
        'p.id',
        'p.tag',
        'p.motion',
        'm.id as machineId',
        'm.tag as machineTag',
        'site.id as siteId',
      ])
      .where('p.id', '=', positionId)
      .executeTakeFirst();
  }

  /** Next document number of a site, e.g. HF-NRW-0007; serialised by the site row lock. */
  async nextDocumentNumber(siteId: string, tx: Tx): Promise<string> {
    const row = await on(this.db, tx)
      .updateTable('sites')
      .set((eb) => ({ nextSheetNumber: eb('nextSheetNumber', '+', 1) }))
      .where('id', '=', siteId)
      .returning(['code', 'nextSheetNumber'])
      .executeTakeFirstOrThrow();
    return `HF-${row.code}-${String(row.nextSheetNumber - 1).padStart(4, '0')}`;
  }

  async criteriaSetExists(criteriaSetId: string, tx?: Tx): Promise<boolean> {
    const set = await on(this.db, tx)
      .selectFrom('criteriaSets')
      .select('id')
      .where('id', '=', criteriaSetId)
      .executeTakeFirst();
    return set !== undefined;
  }

  async insert(values: NewSheet, tx: Tx): Promise<string> {
    const row = await on(this.db, tx)
      .insertInto('sheets')
      .values(values)
      .returning('id')
      .executeTakeFirstOrThrow();
    return row.id;
  }

  /** The sheet, locked until the transaction ends (one new revision at a time). */
  findForUpdate(id: string, tx: Tx): Promise<SheetRow | undefined> {
    return on(this.db, tx)
      .selectFrom('sheets')
      .selectAll()
      .where('id', '=', id)
      .forUpdate()
      .executeTakeFirst();
  }

  async exists(id: string, tx?: Tx): Promise<boolean> {
    const row = await on(this.db, tx)
      .selectFrom('sheets')
      .select('id')
      .where('id', '=', id)
      .executeTakeFirst();
    return row !== undefined;
  }
}
