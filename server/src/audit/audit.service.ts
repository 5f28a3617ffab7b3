import { Injectable } from '@nestjs/common';
import type { AuditEvent } from '@holdfast/shared';
import type { Tx } from '../database/unit-of-work.js';
import { AuditRepository } from './audit.repository.js';

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

/**
 * The append-only trail (the table refuses UPDATE and DELETE). Write inside the change's
 * transaction: `record(tx, …)` with the `Tx` of `UnitOfWork.run`.
 */
@Injectable()
export class AuditService {
  constructor(private readonly repo: AuditRepository) {}

  async record(tx: Tx, entry: AuditEntry): Promise<void> {
    await this.repo.append(
      {
        actorId: entry.actorId,
        action: entry.action,
        entity: entry.entity,
        entityId: entry.entityId,
        sheetId: entry.sheetId ?? null,
        before: json(entry.before),
        after: json(entry.after),
      },
      tx,
    );
  }

  async forSheet(sheetId: string): Promise<AuditEvent[]> {
    const rows = await this.repo.forSheet(sheetId);
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
