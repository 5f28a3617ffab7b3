import { Injectable } from '@nestjs/common';
import type { SheetInputs } from '@holdfast/calc';
import { canonicalJson, type Revision, type SaveRevisionInput } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { conflict, forbidden, notFound } from '../common/errors/api-exception.js';
import { type Tx, UnitOfWork } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { CriteriaService } from '../criteria/criteria.service.js';
import { canCheck, canEdit, canReadContent, isEditableState } from './revision-access.js';
import { toRevision } from './revision-mapper.js';
import { RevisionsRepository, type RevisionWithSheet } from './revisions.repository.js';
import { previewOrReject, rejectUnknownInputs } from '../calc/evaluate.js';
import { coreVersion } from '../calc/calc-engine.js';
import { UsersRepository } from '../users/users.repository.js';

@Injectable()
export class RevisionsService {
  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: RevisionsRepository,
    private readonly users: UsersRepository,
    private readonly criteria: CriteriaService,
    private readonly audit: AuditService,
  ) {}

  /** The revision, 404 when missing, 403 when the caller may not read drafts. */
  async load(user: AuthUser, id: string, tx?: Tx, lock = false): Promise<RevisionWithSheet> {
    const rev = await this.repo.find(id, tx, lock);
    if (!rev) throw notFound('Revision not found.');
    if (!canReadContent(user, rev))
      throw forbidden('Only approved revisions are open to your role.');
    return rev;
  }

  async get(user: AuthUser, id: string): Promise<Revision> {
    return this.present(user, await this.load(user, id));
  }

  async present(user: AuthUser, rev: RevisionWithSheet): Promise<Revision> {
    const people = await this.users.people([rev.authorId, rev.checkerId]);
    const editable = canEdit(user, rev);
    return toRevision(rev, people, {
      supersededByLabel: rev.supersededById ? await this.repo.label(rev.supersededById) : undefined,
      canEdit: editable,
      canSubmit: editable,
      canCheck: canCheck(user, rev),
    });
  }

  /** Refuse a change to a revision that is not the caller's to edit, or is stale. */
  assertEditable(user: AuthUser, rev: RevisionWithSheet, rowVersion: number): void {
    if (!isEditableState(rev.state)) {
      throw conflict(
        `Revision ${rev.label} is ${rev.state.replace('_', ' ')} and cannot be changed.`,
        {
          state: rev.state,
          currentRowVersion: rev.rowVersion,
        },
      );
    }
    if (!canEdit(user, rev))
      throw forbidden('Only the author or the sheet owner can edit this revision.');
    assertRowVersion(rev, rowVersion);
  }

  /** Draft save: server-side preview evaluation, optimistic concurrency, audit. */
  async save(user: AuthUser, id: string, input: SaveRevisionInput): Promise<Revision> {
    await this.units.run(async (tx) => {
      const rev = await this.load(user, id, tx, true);
      this.assertEditable(user, rev, input.rowVersion);
      const criteriaSetId = input.criteriaSetId ?? rev.criteriaSetId;
      const criteria = await this.criteria.load(criteriaSetId, 'latest', tx);
      const inputs = input.inputs as SheetInputs;
      rejectUnknownInputs(rev.sheetType, inputs);
      // A draft may still lack fields or hold blanks: it is previewed when complete, and submit
      // insists on every required field.
      const evaluation = previewOrReject(rev.sheetType, inputs, criteria);
      const unconfirmed = stillUnconfirmed(rev, inputs, input.unconfirmed);
      await this.repo.updateAtVersion(
        id,
        input.rowVersion,
        {
          inputs: JSON.stringify(input.inputs),
          unitSystem: input.unitSystem,
          changeNote: input.changeNote,
          criteriaSetId,
          criteriaSetVersion: criteria.version,
          evaluation: evaluation ? JSON.stringify(evaluation) : null,
          coreVersion: evaluation ? coreVersion() : null,
          unconfirmed: JSON.stringify(unconfirmed),
          // A returned revision's old hash and code no longer describe it.
          hash: null,
          verificationCode: null,
          // Four-eyes by person: whoever saves a change may not approve this revision.
          editorIds: withPerson(rev.editorIds, user.id),
          rowVersion: rev.rowVersion + 1,
        },
        tx,
      );
      if (criteriaSetId !== rev.criteriaSetId)
        await this.repo.setSheetCriteriaSet(rev.sheetId, criteriaSetId, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'revision.saved',
        entity: 'revision',
        entityId: id,
        sheetId: rev.sheetId,
        before: snapshot(rev),
        after: {
          state: rev.state,
          rowVersion: rev.rowVersion + 1,
          inputs: input.inputs,
          unitSystem: input.unitSystem,
          changeNote: input.changeNote,
          criteriaSet: `${criteriaSetId}@${criteria.version}`,
          ...(unconfirmed.length !== storedUnconfirmed(rev).length ? { unconfirmed } : {}),
        },
      });
      // Confirming example values without changing them is a judgement, not an edit: it gets an
      // entry of its own, shown in the trail by default (draft saves are folded away).
      const confirmed = confirmedUnchanged(rev, inputs, unconfirmed);
      if (confirmed.length > 0)
        await this.audit.record(tx, {
          actorId: user.id,
          action: 'revision.values-confirmed',
          entity: 'revision',
          entityId: id,
          sheetId: rev.sheetId,
          after: { label: rev.label, confirmed, count: confirmed.length },
        });
    });
    return this.get(user, id);
  }
}

/** The list with the person added once. */
export function withPerson(ids: readonly string[], id: string): string[] {
  return ids.includes(id) ? [...ids] : [...ids, id];
}

export function assertRowVersion(
  rev: { rowVersion: number; label: string },
  rowVersion: number,
): void {
  if (rev.rowVersion !== rowVersion) {
    throw conflict(
      `Revision ${rev.label} was changed by someone else (version ${rev.rowVersion}, yours ${rowVersion}). Reload and apply your change again.`,
      { currentRowVersion: rev.rowVersion },
    );
  }
}

export function storedUnconfirmed(rev: { unconfirmed: unknown }): string[] {
  return Array.isArray(rev.unconfirmed) ? (rev.unconfirmed as string[]) : [];
}

/**
 * The unconfirmed fields after a save. The list only shrinks: a key stays when it was unconfirmed
 * before, its value did not change, and the author did not confirm it (left out of `kept`).
 */
export function stillUnconfirmed(
  rev: { unconfirmed: unknown; inputs: unknown },
  inputs: SheetInputs,
  kept: string[] | undefined,
): string[] {
  const before = storedUnconfirmed(rev);
  const old = (rev.inputs ?? {}) as SheetInputs;
  const keep = kept ? new Set(kept) : null;
  return before.filter(
    // Canonical text: jsonb hands back object keys in its own order.
    (k) => (!keep || keep.has(k)) && canonicalJson(old[k]) === canonicalJson(inputs[k]),
  );
}

/**
 * The fields the author confirmed as they were in this save: unconfirmed before, no longer after,
 * and with the same value (a changed value is an entry, not a confirmation).
 */
export function confirmedUnchanged(
  rev: { unconfirmed: unknown; inputs: unknown },
  inputs: SheetInputs,
  after: readonly string[],
): string[] {
  const old = (rev.inputs ?? {}) as SheetInputs;
  const still = new Set(after);
  // A field left out or emptied is a change too (and canonical JSON has no undefined).
  return storedUnconfirmed(rev).filter(
    (k) =>
      !still.has(k) &&
      old[k] !== undefined &&
      inputs[k] !== undefined &&
      canonicalJson(old[k]) === canonicalJson(inputs[k]),
  );
}

/** What an audit entry records of a revision before a change. */
export function snapshot(rev: RevisionWithSheet) {
  return {
    state: rev.state,
    rowVersion: rev.rowVersion,
    inputs: rev.inputs,
    unitSystem: rev.unitSystem,
    changeNote: rev.changeNote,
    criteriaSet: `${rev.criteriaSetId}@${rev.criteriaSetVersion}`,
    hash: rev.hash,
  };
}
