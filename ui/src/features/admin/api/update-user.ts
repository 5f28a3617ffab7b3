import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type UpdateUserInput, type User, type UserList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { getUsersQueryOptions } from './get-users';

export interface UpdateUserVariables {
  id: string;
  changes: UpdateUserInput;
}

export function updateUser({ id, changes }: UpdateUserVariables): Promise<User> {
  return api.patch(apiPath(apiRoutes.users.update, { id }), { body: changes, schema: userSchema });
}

/** Change a user's role or active flag; the list shows the server's answer at once. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  const listKey = getUsersQueryOptions().queryKey;
  return useMutation({
    mutationFn: updateUser,
    onSuccess: (user) => {
      queryClient.setQueryData<UserList>(listKey, (old) =>
        old ? { items: old.items.map((u) => (u.id === user.id ? user : u)) } : old,
      );
      return queryClient.invalidateQueries({ queryKey: listKey });
    },
  });
}
