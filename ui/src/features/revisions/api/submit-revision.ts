import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { revisionSchema, type Revision, type SubmitRevisionInput } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { revisionKeys, staleAfterStateChange } from '../../../lib/query-keys';

export function submitRevision(id: string, input: SubmitRevisionInput): Promise<Revision> {
  return api.post(apiPath(apiRoutes.revisions.submit, { id }), {
    body: input,
    schema: revisionSchema,
  });
}

/** Sends a revision to check; failing checks need a justification. */
export function useSubmitRevision(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SubmitRevisionInput) => submitRevision(id, input),
    onSuccess: (revision) => {
      queryClient.setQueryData(revisionKeys.detail(id), revision);
      void queryClient.invalidateQueries({ queryKey: revisionKeys.comments(id) });
      for (const key of staleAfterStateChange)
        void queryClient.invalidateQueries({ queryKey: key });
    },
  });
}
