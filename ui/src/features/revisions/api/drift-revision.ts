import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation } from '@tanstack/react-query';
import { driftReportSchema, type DriftReport } from '@holdfast/shared';
import { api } from '../../../lib/api-client';

export function driftRevision(id: string): Promise<DriftReport> {
  return api.post(apiPath(apiRoutes.revisions.drift, { id }), { schema: driftReportSchema });
}

/** Recomputes an approved revision with today's calc core and reports what moved. */
export function useDriftRevision(id: string) {
  return useMutation({ mutationFn: () => driftRevision(id) });
}
