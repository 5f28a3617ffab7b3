import { z } from 'zod';
import { isoDateSchema } from '../sheets/person-ref.schema.js';
import { fieldRecordKindSchema, fieldRecordStatusSchema } from './field-record.schema.js';

/**
 * GET /api/verify/:code when the code is printed on a field record (public): the record's status
 * and which revision the brake was set to, nothing else. `kind: 'field-record'` tells it apart
 * from a sheet's answer, which has no `kind`.
 */
export const fieldRecordVerifySchema = z.object({
  kind: z.literal('field-record'),
  recordKind: fieldRecordKindSchema,
  positionTag: z.string(),
  performedAt: isoDateSchema,
  status: fieldRecordStatusSchema,
  signedAt: isoDateSchema.nullable(),
  countersignedAt: isoDateSchema.nullable(),
  setTo: z.object({
    documentNumber: z.string(),
    revisionLabel: z.string(),
    /** The revision is still the approved one in force for the sheet. */
    current: z.boolean(),
    underReview: z.boolean(),
  }),
});
export type FieldRecordVerify = z.infer<typeof fieldRecordVerifySchema>;
