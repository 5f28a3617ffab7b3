import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation } from '@tanstack/react-query';
import { passwordResetIssuedSchema, type PasswordResetIssued } from '@holdfast/shared';
import { api } from '../../../lib/api-client';

export function resetPassword(id: string): Promise<PasswordResetIssued> {
  return api.post(apiPath(apiRoutes.users.sendPasswordReset, { id }), {
    schema: passwordResetIssuedSchema,
  });
}

/** Admin reset: the user's password stops working and a one-time link is mailed to them. */
export function useResetPassword() {
  return useMutation({ mutationFn: resetPassword });
}
