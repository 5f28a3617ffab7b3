import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { revisionSchema, type NewRevisionInput, type Revision } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { revisionKeys, sheetKeys, workQueueKeys } from '../../../lib/query-keys';

export function createRevision(sheetId: string, input: NewRevisionInput): Promise<Revision> {
  return api.post(apiPath(apiRoutes.sheets.createRevision, { id: sheetId }), {
    body: input,
    schema: revisionSchema,
  });
}

/** Starts the next revision (B, C …) of a sheet from a copy of its latest inputs. */
export function useCreateRevision(sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: NewRevisionInput) => createRevision(sheetId, input),
    onSuccess: (revision) => {
      queryClient.setQueryData(revisionKeys.detail(revision.id), revision);
      void queryClient.invalidateQueries({ queryKey: sheetKeys.detail(sheetId) });
      void queryClient.invalidateQueries({ queryKey: sheetKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: workQueueKeys.all });
    },
  });
}
