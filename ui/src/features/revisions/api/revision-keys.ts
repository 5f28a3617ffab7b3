/** Query keys of a revision and what hangs off it (comments, attachments). */
export const revisionKeys = {
  all: ['revisions'] as const,
  details: () => [...revisionKeys.all, 'detail'] as const,
  detail: (id: string) => [...revisionKeys.details(), id] as const,
  comments: (id: string) => [...revisionKeys.detail(id), 'comments'] as const,
  attachments: (id: string) => [...revisionKeys.detail(id), 'attachments'] as const,
  drift: (id: string) => [...revisionKeys.detail(id), 'drift'] as const,
  changes: (id: string) => [...revisionKeys.detail(id), 'changes'] as const,
};

/** Other owners' roots that a revision's state change makes stale. */
export const staleAfterStateChange = [['sheets'], ['work-queue'], ['register']] as const;
