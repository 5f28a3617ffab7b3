import { useMutation, useQueryClient } from '@tanstack/react-query';
import { revisionSchema, type Revision, type SaveRevisionInput } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { revisionKeys } from './revision-keys';

export function saveRevision(id: string, input: SaveRevisionInput): Promise<Revision> {
  return api.put(`/revisions/${id}`, { body: input, schema: revisionSchema });
}

/** Saves a draft with its row version; a 409 means someone else saved in between. */
export function useSaveRevision(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SaveRevisionInput) => saveRevision(id, input),
    onSuccess: (revision) => {
      queryClient.setQueryData(revisionKeys.detail(id), revision);
      void queryClient.invalidateQueries({ queryKey: ['work-queue'] });
    },
  });
}
