import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { criteriaSetDetailSchema, type CriteriaSetDetail } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { criteriaKeys } from '../../../lib/query-keys';

export function getCriteriaSet(
  id: string,
  version?: number,
  signal?: AbortSignal,
): Promise<CriteriaSetDetail> {
  return api.get(apiPath(apiRoutes.criteria.detail, { id }), {
    query: { version },
    schema: criteriaSetDetailSchema,
    signal,
  });
}

/** A published version never changes, so a pinned version is cached for good. */
export function criteriaSetQueryOptions(id: string, version?: number) {
  return queryOptions({
    queryKey: criteriaKeys.detail(id, version),
    queryFn: ({ signal }) => getCriteriaSet(id, version, signal),
    staleTime: version === undefined ? 30_000 : Infinity,
    enabled: Boolean(id),
  });
}

export function useCriteriaSet(id: string, version?: number) {
  return useQuery(criteriaSetQueryOptions(id, version));
}
