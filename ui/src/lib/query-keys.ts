import type { SheetListQuery } from '@holdfast/shared';

// Every TanStack Query key of the workbench is made here, so that what an invalidation refreshes
// can be read in one place: a key's prefix is its owner, and invalidating a prefix refreshes all
// keys below it (a revision's comments, attachments and drift hang under the revision).

export type SheetListParams = Partial<SheetListQuery>;

/** The signed-in user's own data. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};

/** User administration. */
export const userKeys = {
  all: ['users'] as const,
  list: () => [...userKeys.all, 'list'] as const,
};

/** Mail that failed for good (admin). */
export const failedMailKeys = { list: () => ['admin', 'mail', 'failed'] as const };

/** Sheets: invalidating `all` refreshes lists and details. */
export const sheetKeys = {
  all: ['sheets'] as const,
  lists: () => [...sheetKeys.all, 'list'] as const,
  list: (params: SheetListParams) => [...sheetKeys.lists(), params] as const,
  details: () => [...sheetKeys.all, 'detail'] as const,
  detail: (id: string) => [...sheetKeys.details(), id] as const,
  audit: (id: string) => [...sheetKeys.detail(id), 'audit'] as const,
  compare: (id: string, from: string, to: string) =>
    [...sheetKeys.detail(id), 'compare', from, to] as const,
};

/** A revision and what hangs off it. */
export const revisionKeys = {
  all: ['revisions'] as const,
  details: () => [...revisionKeys.all, 'detail'] as const,
  detail: (id: string) => [...revisionKeys.details(), id] as const,
  comments: (id: string) => [...revisionKeys.detail(id), 'comments'] as const,
  attachments: (id: string) => [...revisionKeys.detail(id), 'attachments'] as const,
  drift: (id: string) => [...revisionKeys.detail(id), 'drift'] as const,
  changes: (id: string) => [...revisionKeys.detail(id), 'changes'] as const,
};

export const workQueueKeys = { all: ['work-queue'] as const };
export const registerKeys = { all: ['register'] as const };

/** Other owners' roots that a revision's state change makes stale. */
export const staleAfterStateChange = [sheetKeys.all, workQueueKeys.all, registerKeys.all] as const;

export const criteriaKeys = {
  all: ['criteria-sets'] as const,
  list: () => [...criteriaKeys.all, 'list'] as const,
  detail: (id: string, version?: number) =>
    [...criteriaKeys.all, 'detail', id, version ?? 'latest'] as const,
  impact: (id: string, version?: number) =>
    [...criteriaKeys.all, 'impact', id, version ?? 'latest'] as const,
};

/** Under the criteria keys, so publishing a criteria version refreshes every review flag. */
export const reviewKeys = {
  all: [...criteriaKeys.all, 'reviews'] as const,
  revision: (revisionId: string) => [...reviewKeys.all, 'revision', revisionId] as const,
  queue: () => [...reviewKeys.all, 'queue'] as const,
};

/** Field records: the fitters' work on a position, and the form a record is made from. */
export const fieldRecordKeys = {
  all: ['field-records'] as const,
  history: (positionId: string) => [...fieldRecordKeys.all, 'position', positionId] as const,
  state: (positionId: string) => [...fieldRecordKeys.all, 'state', positionId] as const,
  due: () => [...fieldRecordKeys.all, 'due'] as const,
  list: (status: string) => [...fieldRecordKeys.all, 'list', status] as const,
};
export const fieldFormKeys = {
  form: (revisionId: string) => ['field-form', revisionId] as const,
};

/** Public verification look-ups. */
export const verifyKeys = { code: (code: string) => ['verify', code] as const };
