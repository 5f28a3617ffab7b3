import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  criteriaSetDetailSchema,
  type CriteriaSetDetail,
  type PublishCriteriaVersionInput,
} from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { criteriaKeys } from '../../../lib/query-keys';

export function publishCriteriaVersion(
  id: string,
  input: PublishCriteriaVersionInput,
): Promise<CriteriaSetDetail> {
  return api.post(apiPath(apiRoutes.criteria.publish, { id }), {
    body: input,
    schema: criteriaSetDetailSchema,
  });
}

export function usePublishCriteriaVersion(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PublishCriteriaVersionInput) => publishCriteriaVersion(id, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: criteriaKeys.all }),
  });
}
