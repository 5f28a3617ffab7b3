import { z } from 'zod';
import { revisionStateSchema } from '../revisions/evaluation.schema.js';
import { isoDateSchema } from '../sheets/person-ref.schema.js';

/**
 * Digits a reader types for the letter they see: the code's alphabet (RFC 4648 base32) has no 0,
 * 1 or 8, so these can only mean O, I and B.
 */
const LOOK_ALIKES: Readonly<Record<string, string>> = { '0': 'O', '1': 'I', '8': 'B' };

/**
 * Shape of a printed verification code: 10 characters of RFC 4648 base32. What a reader types is
 * taken as meant: any case, spaces and hyphens ignored, a 0, 1 or 8 read as O, I or B.
 */
export const verificationCodeSchema = z
  .string()
  .transform((s) =>
    s
      .toUpperCase()
      .replace(/[\s-]+/g, '')
      .replace(/[018]/g, (c) => LOOK_ALIKES[c]!),
  )
  .pipe(
    z
      .string()
      .regex(
        /^[A-Z2-7]{10}$/,
        'a verification code is 10 characters: the letters A to Z and the digits 2 to 7',
      ),
  );

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
