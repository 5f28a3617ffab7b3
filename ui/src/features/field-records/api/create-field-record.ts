import { apiPath, apiRoutes } from '@holdfast/shared';
import { fieldRecordSchema, type CreateFieldRecordInput, type FieldRecord } from '@holdfast/shared';
import { api } from '../../../lib/api-client';

/**
 * POST a field record. Safe to repeat: the server answers a second create with the same id with
 * the record it already has, so the offline outbox may send again after an unclear failure.
 */
export function createFieldRecord(payload: CreateFieldRecordInput): Promise<FieldRecord> {
  return api.post(apiPath(apiRoutes.fieldRecords.create), {
    body: payload,
    schema: fieldRecordSchema,
  });
}
