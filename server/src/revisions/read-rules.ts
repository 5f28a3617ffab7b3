import type { AuditEvent, SheetDetail } from '@holdfast/shared';
import { effectiveRoles } from '../auth/policy.js';
import { canReadContent, type AccessUser } from './revision-access.js';

/**
 * One read rule for revisions wherever their content shows: in GET revision, the sheet's
 * revision list and the audit trail. Who may not read a draft (viewers, admins) sees released
 * revisions whole and, of the rest, only that they exist and what state they are in.
 */
export function canReadDrafts(user: AccessUser): boolean {
  return canReadContent(user, { state: 'draft' });
}

/** The sheet as `user` may see it: change notes of unreleased revisions blanked. */
export function sheetDetailFor(user: AccessUser, detail: SheetDetail): SheetDetail {
  if (canReadDrafts(user)) return detail;
  return {
    ...detail,
    revisions: detail.revisions.map((r) =>
      canReadContent(user, r) ? r : { ...r, changeNote: '' },
    ),
  };
}

/** Audit payloads carry draft inputs, notes and hashes: without draft access, state and label only. */
const publicAuditKeys = ['state', 'label'];

function pickPublic(value: unknown): unknown {
  if (!value || typeof value !== 'object') return value ?? null;
  const out: Record<string, unknown> = {};
  for (const key of publicAuditKeys) {
    if (key in value) out[key] = (value as Record<string, unknown>)[key];
  }
  return out;
}

export function auditFor(user: AccessUser, items: AuditEvent[]): AuditEvent[] {
  if (canReadDrafts(user)) return items;
  return items.map((e) => ({ ...e, before: pickPublic(e.before), after: pickPublic(e.after) }));
}

/**
 * Who may comment on a revision. While it is open (draft, in check, returned) any engineer or
 * checker may; once approved or superseded it is a record, and only a checker or the sheet's
 * owner may still add a note (for instance a field finding that calls for a new revision).
 */
export function canComment(user: AccessUser, rev: { state: string; ownerId: string }): boolean {
  const roles = effectiveRoles(user.role);
  if (!roles.includes('engineer')) return false;
  if (rev.state !== 'approved' && rev.state !== 'superseded') return true;
  return roles.includes('checker') || rev.ownerId === user.id;
}
