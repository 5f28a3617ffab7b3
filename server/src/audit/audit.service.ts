import { Injectable } from '@nestjs/common';
import type { Kysely } from 'kysely';
import type { AuditEvent } from '@holdfast/shared';
import type { DB } from '@holdfast/db';
import { Database } from '../database/database.js';

export interface AuditEntry {
  actorId: string | null;
  /** e.g. 'revision.saved', 'revision.submitted', 'sheet.created'. */
  action: string;
  entity:
    'sheet' | 'revision' | 'comment' | 'attachment' | 'criteria-set' | 'register' | 'field-record';
  entityId: string;
  sheetId?: string | null;
  before?: unknown;
  after?: unknown;
}

const json = (v: unknown) => (v === undefined || v === null ? null : JSON.stringify(v));

/** The append-only trail (the table refuses UPDATE and DELETE). Write inside the change's transaction. */
@Injectable()
export class AuditService {
  constructor(private readonly db: Database) {}

  async record(trx: Kysely<DB>, entry: AuditEntry): Promise<void> {
    await trx
      .insertInto('auditEvents')
      .values({
        actorId: entry.actorId,
        action: entry.action,
        entity: entry.entity,
        entityId: entry.entityId,
        sheetId: entry.sheetId ?? null,
        before: json(entry.before),
        after: json(entry.after),
      })
      .execute();
  }

  async forSheet(sheetId: string): Promise<AuditEvent[]> {
    const rows = await this.db
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
    return rows.map((r) => ({
      id: r.id,
      at: r.at.toISOString(),
      actor: r.actorId
        ? { id: r.actorId, displayName: r.displayName ?? '', initials: r.initials ?? '' }
        : null,
      action: r.action,
      entity: r.entity,
      entityId: r.entityId,
      before: r.before ?? null,
      after: r.after ?? null,
    }));
  }
}
