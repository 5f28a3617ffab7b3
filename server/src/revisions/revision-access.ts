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
  /** Who saved a change and who submitted it (four-eyes by person). */
  editorIds?: readonly string[];
  submitterIds?: readonly string[];
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

/**
 * What the person did to the revision that bars them from checking it ('authored', 'edited',
 * 'submitted'), or undefined when they kept their hands off it.
 */
export function ownPart(
  userId: string,
  r: Pick<AccessRevision, 'authorId' | 'editorIds' | 'submitterIds'>,
): string | undefined {
  const parts = [
    r.authorId === userId && 'authored',
    r.editorIds?.includes(userId) && 'edited',
    r.submitterIds?.includes(userId) && 'submitted',
  ].filter((p): p is string => typeof p === 'string');
  if (parts.length === 0) return undefined;
  return parts.length === 1 ? parts[0] : `${parts.slice(0, -1).join(', ')} and ${parts.at(-1)}`;
}

/** A checker who neither authored, edited nor submitted the revision checks it. */
export function canCheck(u: AccessUser, r: AccessRevision): boolean {
  return has(u, 'checker') && r.state === 'in_check' && ownPart(u.id, r) === undefined;
}

/** Viewers (and admins) read released records only: approved and superseded revisions. */
export function canReadContent(u: AccessUser, r: { state: string }): boolean {
  return has(u, 'engineer') || r.state === 'approved' || r.state === 'superseded';
}
