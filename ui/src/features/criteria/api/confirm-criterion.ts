import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  criteriaSetDetailSchema,
  type ConfirmCriterionInput,
  type CriteriaSetDetail,
} from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { criteriaKeys } from '../../../lib/query-keys';

export function confirmCriterion(
  setId: string,
  version: number,
  input: ConfirmCriterionInput,
): Promise<CriteriaSetDetail> {
  return api.post(apiPath(apiRoutes.criteria.confirm, { id: setId, version }), {
    body: input,
    schema: criteriaSetDetailSchema,
  });
}

export function useConfirmCriterion(setId: string, version: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ConfirmCriterionInput) => confirmCriterion(setId, version, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: criteriaKeys.all }),
  });
}
