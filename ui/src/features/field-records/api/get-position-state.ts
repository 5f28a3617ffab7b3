import { apiPath, apiRoutes } from '@holdfast/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { positionFieldStateSchema, type PositionFieldState } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { fieldRecordKeys } from '../../../lib/query-keys';

export function getPositionState(
  positionId: string,
  signal?: AbortSignal,
): Promise<PositionFieldState> {
  return api.get(apiPath(apiRoutes.fieldRecords.positionState, { positionId }), {
    schema: positionFieldStateSchema,
    signal,
  });
}

/** The brake at a glance: set to which revision, last inspected, next due, open findings. */
export function positionStateQueryOptions(positionId: string) {
  return queryOptions({
    queryKey: fieldRecordKeys.state(positionId),
    queryFn: ({ signal }) => getPositionState(positionId, signal),
  });
}

export function usePositionState(positionId: string) {
  return useQuery(positionStateQueryOptions(positionId));
}
