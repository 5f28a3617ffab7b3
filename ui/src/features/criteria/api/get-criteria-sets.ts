import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { criteriaSetListSchema, type CriteriaSetList } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { criteriaKeys } from '../../../lib/query-keys';

export function getCriteriaSets(signal?: AbortSignal): Promise<CriteriaSetList> {
  return api.get(apiPath(apiRoutes.criteria.list), { schema: criteriaSetListSchema, signal });
}

export function criteriaSetsQueryOptions() {
  return queryOptions({
    queryKey: criteriaKeys.list(),
    queryFn: ({ signal }) => getCriteriaSets(signal),
  });
}

export function useCriteriaSets() {
  return useQuery(criteriaSetsQueryOptions());
}
