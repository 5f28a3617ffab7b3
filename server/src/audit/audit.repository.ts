import { Injectable } from '@nestjs/common';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

export interface AuditRow {
  actorId: string | null;
  action: string;
  entity: string;
  entityId: string;
  sheetId: string | null;
  before: string | null;
  after: string | null;
}

/** The audit table: appended to inside the change's transaction, read per sheet. */
@Injectable()
export class AuditRepository {
  constructor(private readonly db: Database) {}

  async append(row: AuditRow, tx: Tx): Promise<void> {
    await on(this.db, tx).insertInto('auditEvents').values(row).execute();
  }

  forSheet(sheetId: string) {
    return this.db
      .selectFrom('auditEvents as a')
      .leftJoin('users as u', 'u.id', 'a.actorId')
      .select([
        'a.id',
        'a.at',
        'a.action',
        'a.entity',
        'a.entityId',
        'a.before',
        'a.after',
        'u.id as actorId',
        'u.displayName',
        'u.initials',
      ])
      .where('a.sheetId', '=', sheetId)
      .orderBy('a.at', 'asc')
      .orderBy('a.id', 'asc')
      .execute();
  }

  /** When an entity had `action` done to it and what it was before, newest first. */
  eventsFor(entityId: string, action: string, tx?: Tx) {
    return on(this.db, tx)
      .selectFrom('auditEvents')
      .select(['at', 'before'])
      .where('entityId', '=', entityId)
      .where('action', '=', action)
      .orderBy('at', 'desc')
      .orderBy('id', 'desc')
      .execute();
  }
}
