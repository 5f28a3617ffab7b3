import {
  apiPath,
  apiRoutes,
  fieldRecordSchema,
  type FieldRecord,
  type UpdateFieldRecordInput,
} from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { fieldRecordKeys } from '../../../lib/query-keys';
import { replaceOutboxPayload } from '../offline/outbox-store';

/** Changes a saved, unsigned record of one's own on the server (the server judges it again). */
export function updateFieldRecord(id: string, body: UpdateFieldRecordInput): Promise<FieldRecord> {
  return api.patch(apiPath(apiRoutes.fieldRecords.update, { id }), {
    body,
    schema: fieldRecordSchema,
  });
}

/**
 * Saves changes made after the record reached the server; the copy kept on the device takes them
 * too, so what the form shows, what is stored and what is signed are the same.
 */
export function useUpdateFieldRecord() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (vars: { id: string; body: UpdateFieldRecordInput }) => {
      const saved = await updateFieldRecord(vars.id, vars.body);
      await replaceOutboxPayload(vars.id, vars.body);
      return saved;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fieldRecordKeys.all }),
  });
}
