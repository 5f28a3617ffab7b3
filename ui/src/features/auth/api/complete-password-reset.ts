import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation } from '@tanstack/react-query';
import type { CompletePasswordResetInput } from '@holdfast/shared';
import { api } from '../../../lib/api-client';

export function completePasswordReset(input: CompletePasswordResetInput): Promise<unknown> {
  // Signed out: no token, and a 4xx is about the link or the password, not the session.
  return api.post(apiPath(apiRoutes.auth.completePasswordReset), { body: input, auth: false });
}

export function useCompletePasswordReset() {
  return useMutation({ mutationFn: completePasswordReset });
}
