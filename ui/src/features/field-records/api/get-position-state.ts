import { queryOptions, useQuery } from '@tanstack/react-query';
import { positionFieldStateSchema, type PositionFieldState } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { fieldApi } from './paths';
import { fieldRecordKeys } from './sign-field-record';

export function getPositionState(
  positionId: string,
  signal?: AbortSignal,
): Promise<PositionFieldState> {
  return api.get(fieldApi('positionState', { positionId }), {
    schema: positionFieldStateSchema,
    signal,
  });
}

/** The brake at a glance: set to which revision, last inspected, next due, open findings. */
export function positionStateQueryOptions(positionId: string) {
  return queryOptions({
    queryKey: [...fieldRecordKeys.all, 'state', positionId] as const,
    queryFn: ({ signal }) => getPositionState(positionId, signal),
  });
}

export function usePositionState(positionId: string) {
  return useQuery(positionStateQueryOptions(positionId));
}
