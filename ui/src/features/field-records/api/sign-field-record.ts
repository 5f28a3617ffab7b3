import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fieldRecordSchema, type FieldRecord } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { fieldRecordKeys } from '../../../lib/query-keys';

/** The technician signs the record as themself. */
export function signFieldRecord(id: string): Promise<FieldRecord> {
  return api.post(apiPath(apiRoutes.fieldRecords.sign, { id }), {
    body: {},
    schema: fieldRecordSchema,
  });
}

/** A plant engineer countersigns; the record is immutable from then on. */
export function countersignFieldRecord(id: string, note = ''): Promise<FieldRecord> {
  return api.post(apiPath(apiRoutes.fieldRecords.countersign, { id }), {
    body: { note },
    schema: fieldRecordSchema,
  });
}

export function useSignFieldRecord() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (vars: { id: string; counter?: boolean; note?: string }) =>
      vars.counter ? countersignFieldRecord(vars.id, vars.note) : signFieldRecord(vars.id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fieldRecordKeys.all }),
  });
}
