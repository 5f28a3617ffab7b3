import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { userListSchema, type UserList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { userKeys } from '../../../lib/query-keys';

export function getUsers(signal?: AbortSignal): Promise<UserList> {
  return api.get(apiPath(apiRoutes.users.list), { schema: userListSchema, signal });
}

export const getUsersQueryOptions = () =>
  queryOptions({ queryKey: userKeys.list(), queryFn: ({ signal }) => getUsers(signal) });

export function useUsers() {
  return useSuspenseQuery(getUsersQueryOptions());
}
