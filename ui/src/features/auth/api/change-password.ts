import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sessionSchema, type ChangePasswordInput, type Session } from '@holdfast/shared';
import { api, startSession } from '../../../lib/api-client';
import { getMeQueryOptions } from './get-me';

export function changePassword(input: ChangePasswordInput): Promise<Session> {
  return api.post(apiPath(apiRoutes.auth.changePassword), { body: input, schema: sessionSchema });
}

/** Change one's own password; the server ends every other session and answers with a new one. */
export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changePassword,
    onSuccess: (session) => {
      startSession(session);
      queryClient.setQueryData(getMeQueryOptions().queryKey, session.user);
    },
  });
}
