import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sessionSchema, type Session, type SignInInput } from '@holdfast/shared';
import { api, startSession } from '../../../lib/api-client';
import { getMeQueryOptions } from './get-me';

export function signIn(input: SignInInput): Promise<Session> {
  // No token and no refresh-on-401 here: a 401 means wrong credentials, not an expired session.
  return api.post(apiPath(apiRoutes.auth.signIn), {
    body: input,
    schema: sessionSchema,
    auth: false,
  });
}

export function useSignIn({ onSuccess }: { onSuccess?: (session: Session) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => {
      // Nothing cached for a previous user may leak into this session.
      queryClient.clear();
      startSession(session);
      queryClient.setQueryData(getMeQueryOptions().queryKey, session.user);
      onSuccess?.(session);
    },
  });
}
