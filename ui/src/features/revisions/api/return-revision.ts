import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { revisionSchema, type Revision, type ReturnRevisionInput } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { revisionKeys, staleAfterStateChange } from '../../../lib/query-keys';

export function returnRevision(id: string, input: ReturnRevisionInput): Promise<Revision> {
  return api.post(apiPath(apiRoutes.revisions.return, { id }), {
    body: input,
    schema: revisionSchema,
  });
}

/** Returns a revision to its author with a comment saying what must change. */
export function useReturnRevision(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ReturnRevisionInput) => returnRevision(id, input),
    onSuccess: (revision) => {
      queryClient.setQueryData(revisionKeys.detail(id), revision);
      void queryClient.invalidateQueries({ queryKey: revisionKeys.comments(id) });
      for (const key of staleAfterStateChange)
        void queryClient.invalidateQueries({ queryKey: key });
    },
  });
}
