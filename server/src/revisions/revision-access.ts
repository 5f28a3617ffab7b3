import type { Role } from '@holdfast/shared';
import { effectiveRoles } from '../auth/policy.js';

export interface AccessUser {
  id: string;
  role: Role;
}
export interface AccessRevision {
  state: string;
  authorId: string;
  ownerId: string;
}

const has = (u: AccessUser, role: Role) => effectiveRoles(u.role).includes(role);

/** Drafts and returned revisions are editable, by their author or the sheet's owner. */
export function isEditableState(state: string): boolean {
  return state === 'draft' || state === 'returned';
}

export function canEdit(u: AccessUser, r: AccessRevision): boolean {
  return (
    has(u, 'engineer') && isEditableState(r.state) && (u.id === r.authorId || u.id === r.ownerId)
  );
}

/** A checker who did not author the revision checks it. */
export function canCheck(u: AccessUser, r: AccessRevision): boolean {
  return has(u, 'checker') && r.state === 'in_check' && u.id !== r.authorId;
}

/** Viewers (and admins) read released records only: approved and superseded revisions. */
export function canReadContent(u: AccessUser, r: { state: string }): boolean {
  return has(u, 'engineer') || r.state === 'approved' || r.state === 'superseded';
}
