import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  criteriaSetDetailSchema,
  type CreateCriteriaSetInput,
  type CriteriaSetDetail,
} from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { criteriaKeys } from '../../../lib/query-keys';

export function createCriteriaSet(input: CreateCriteriaSetInput): Promise<CriteriaSetDetail> {
  return api.post(apiPath(apiRoutes.criteria.create), {
    body: input,
    schema: criteriaSetDetailSchema,
  });
}

export function useCreateCriteriaSet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCriteriaSet,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: criteriaKeys.all }),
  });
}
