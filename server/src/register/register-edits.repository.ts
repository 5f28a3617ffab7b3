import { Injectable } from '@nestjs/common';
import type { Updateable } from 'kysely';
import type { DB } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';
import { machineColumns, positionColumns, siteColumns } from './register.repository.js';

/**
 * Edits of register entries: each entry is read locked (its "before" for the audit trail stays
 * true until the change commits), then changed and read back.
 */
@Injectable()
export class RegisterEditsRepository {
  constructor(private readonly db: Database) {}

  siteForUpdate(id: string, tx: Tx) {
    return on(this.db, tx)
      .selectFrom('sites')
      .select(siteColumns)
      .where('id', '=', id)
      .forUpdate()
      .executeTakeFirst();
  }

  updateSite(id: string, change: Updateable<DB['sites']>, tx: Tx) {
    return on(this.db, tx)
      .updateTable('sites')
      .set(change)
      .where('id', '=', id)
      .returning(siteColumns)
      .executeTakeFirstOrThrow();
  }

  machineForUpdate(id: string, tx: Tx) {
    return on(this.db, tx)
      .selectFrom('machines')
      .select(machineColumns)
      .where('id', '=', id)
      .forUpdate()
      .executeTakeFirst();
  }

  updateMachine(id: string, change: Updateable<DB['machines']>, tx: Tx) {
    return on(this.db, tx)
      .updateTable('machines')
      .set(change)
      .where('id', '=', id)
      .returning(machineColumns)
      .executeTakeFirstOrThrow();
  }

  positionForUpdate(id: string, tx: Tx) {
    return on(this.db, tx)
      .selectFrom('brakePositions')
      .select(positionColumns)
      .where('id', '=', id)
      .forUpdate()
      .executeTakeFirst();
  }

  updatePosition(id: string, change: Updateable<DB['brakePositions']>, tx: Tx) {
    return on(this.db, tx)
      .updateTable('brakePositions')
      .set(change)
      .where('id', '=', id)
      .returning(positionColumns)
      .executeTakeFirstOrThrow();
  }
}
