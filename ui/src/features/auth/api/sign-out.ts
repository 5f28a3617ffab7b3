import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { sessionStore } from '../../../lib/session';

/** Revoke the refresh token on the server; the local session ends whatever the answer. */
export async function signOut(): Promise<void> {
  try {
    await api.post(apiPath(apiRoutes.auth.signOut), { auth: false });
  } finally {
    sessionStore.end('signed-out');
  }
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSettled: () => queryClient.clear(),
  });
}
