import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { userSchema, type User } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { sessionStore } from '../../../lib/session';
import { authKeys } from '../../../lib/query-keys';

export async function getMe(signal?: AbortSignal): Promise<User> {
  const user = await api.get(apiPath(apiRoutes.auth.me), { schema: userSchema, signal });
  sessionStore.updateUser(user);
  return user;
}

export const getMeQueryOptions = () =>
  queryOptions({ queryKey: authKeys.me(), queryFn: ({ signal }) => getMe(signal) });

/** The signed-in user as the server sees them now (role changes show up here). */
export function useMe() {
  return useQuery(getMeQueryOptions());
}
