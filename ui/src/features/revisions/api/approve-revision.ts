import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { revisionSchema, type Revision, type ApproveRevisionInput } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { revisionKeys, staleAfterStateChange } from '../../../lib/query-keys';

export function approveRevision(id: string, input: ApproveRevisionInput): Promise<Revision> {
  return api.post(apiPath(apiRoutes.revisions.approve, { id }), {
    body: input,
    schema: revisionSchema,
  });
}

/** Approves a revision (a checker who did not author it); the previous approval is superseded. */
export function useApproveRevision(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ApproveRevisionInput) => approveRevision(id, input),
    onSuccess: (revision) => {
      queryClient.setQueryData(revisionKeys.detail(id), revision);
      void queryClient.invalidateQueries({ queryKey: revisionKeys.comments(id) });
      for (const key of staleAfterStateChange)
        void queryClient.invalidateQueries({ queryKey: key });
    },
  });
}
