import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useMutation, useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { failedMailListSchema, type FailedMailList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { failedMailKeys } from '../../../lib/query-keys';

export function getFailedMail(signal?: AbortSignal): Promise<FailedMailList> {
  return api.get(apiPath(apiRoutes.admin.failedMail), { schema: failedMailListSchema, signal });
}

export const getFailedMailQueryOptions = () =>
  queryOptions({ queryKey: failedMailKeys.list(), queryFn: ({ signal }) => getFailedMail(signal) });

export function useFailedMail() {
  return useSuspenseQuery(getFailedMailQueryOptions());
}

export function resendMail(id: string): Promise<unknown> {
  return api.post(apiPath(apiRoutes.admin.resendMail, { id }));
}

/** Queue a failed mail again; it leaves the list at once. */
export function useResendMail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendMail,
    onSuccess: (_answer, id) => {
      queryClient.setQueryData<FailedMailList>(failedMailKeys.list(), (old) =>
        old ? { items: old.items.filter((m) => m.id !== id) } : old,
      );
      return queryClient.invalidateQueries({ queryKey: failedMailKeys.list() });
    },
  });
}
