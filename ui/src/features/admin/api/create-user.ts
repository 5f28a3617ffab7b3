import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type CreateUserInput, type User } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { getUsersQueryOptions } from './get-users';

export function createUser(input: CreateUserInput): Promise<User> {
  return api.post(apiPath(apiRoutes.users.create), { body: input, schema: userSchema });
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey }),
  });
}
