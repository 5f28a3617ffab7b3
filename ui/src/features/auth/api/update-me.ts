import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type User } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { sessionStore } from '../../../lib/session';
import { getMeQueryOptions } from './get-me';

export interface UpdateMeInput {
  unitSystem?: User['unitSystem'];
  numberFormat?: User['numberFormat'];
}

export function updateMe(input: UpdateMeInput): Promise<User> {
  return api.patch(apiPath(apiRoutes.auth.updateMe), { body: input, schema: userSchema });
}

/** Change the signed-in user's own preferences (unit system, number format). */
export function useUpdateMe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMe,
    onSuccess: (user) => {
      sessionStore.updateUser(user);
      queryClient.setQueryData(getMeQueryOptions().queryKey, user);
    },
  });
}
