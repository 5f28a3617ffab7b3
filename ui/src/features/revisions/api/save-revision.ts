import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { revisionSchema, type Revision, type SaveRevisionInput } from '@holdfast/shared';
import { api, apiUrl } from '../../../lib/api-client';
import { sessionStore } from '../../../lib/session';
import { revisionKeys, workQueueKeys } from '../../../lib/query-keys';

export function saveRevision(id: string, input: SaveRevisionInput): Promise<Revision> {
  return api.put(apiPath(apiRoutes.revisions.save, { id }), {
    body: input,
    schema: revisionSchema,
  });
}

/** Saves a draft with its row version; a 409 means someone else saved in between. */
export function useSaveRevision(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SaveRevisionInput) => saveRevision(id, input),
    onSuccess: (revision) => {
      queryClient.setQueryData(revisionKeys.detail(id), revision);
      void queryClient.invalidateQueries({ queryKey: workQueueKeys.all });
    },
  });
}

/**
 * The last save as the page goes away (pagehide): a keepalive request outlives the page, so the
 * browser still sends it after the tab closes. Nobody reads the answer; the next visit loads what
 * the server holds, and the copy kept on the device covers a save that did not land.
 */
export function saveRevisionOnLeave(id: string, input: SaveRevisionInput): void {
  const token = sessionStore.getAccessToken();
  if (!token) return;
  try {
    void fetch(apiUrl(apiPath(apiRoutes.revisions.save, { id })), {
      method: 'PUT',
      keepalive: true,
      credentials: 'same-origin',
      headers: {
        'Content-Type': 'application/json',
        Accept: 'application/json',
        Authorization: `Bearer ${token}`,
      },
      body: JSON.stringify(input),
    }).catch(() => undefined);
  } catch {
    // keepalive bodies are capped (64 KB); the device copy still holds the edits.
  }
}
