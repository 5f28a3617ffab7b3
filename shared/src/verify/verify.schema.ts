import { z } from 'zod';
import { revisionStateSchema } from '../revisions/evaluation.schema.js';
import { isoDateSchema } from '../sheets/person-ref.schema.js';

/** Shape of a printed verification code: 10 characters of RFC 4648 base32. */
export const verificationCodeSchema = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z2-7]{10}$/, 'a verification code is 10 letters and digits');

/** GET /api/verify/:code (public): only these fields, nothing else about the sheet. */
export const verifyResultSchema = z.object({
  documentNumber: z.string(),
  title: z.string(),
  revisionLabel: z.string(),
  state: revisionStateSchema,
  approvedAt: isoDateSchema.nullable(),
  /** True when this revision is the sheet's approved revision in force. */
  current: z.boolean(),
  newerApproved: z.object({ revisionLabel: z.string(), approvedAt: isoDateSchema }).nullable(),
  /** Set while a newer criteria-set version makes this approved revision fail (no details). */
  underReview: z
    .object({ since: isoDateSchema, criteriaSetName: z.string(), criteriaSetVersion: z.number() })
    .nullable(),
});
export type VerifyResult = z.infer<typeof verifyResultSchema>;
