import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { impactReportSchema, type ImpactReport } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { criteriaKeys } from '../../../lib/query-keys';

export function getCriteriaImpact(
  id: string,
  version?: number,
  signal?: AbortSignal,
): Promise<ImpactReport> {
  return api.get(apiPath(apiRoutes.criteria.impact, { id }), {
    query: { version },
    schema: impactReportSchema,
    signal,
  });
}

export function criteriaImpactQueryOptions(id: string, version?: number) {
  return queryOptions({
    queryKey: criteriaKeys.impact(id, version),
    queryFn: ({ signal }) => getCriteriaImpact(id, version, signal),
  });
}

export function useCriteriaImpact(id: string, version?: number, enabled = true) {
  return useQuery({ ...criteriaImpactQueryOptions(id, version), enabled });
}
