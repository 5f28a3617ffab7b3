import { z } from 'zod';
import { isoDateSchema } from '../sheets/person-ref.schema.js';

/** A queued mail that used up every retry without being delivered (admin view). */
export const failedMailSchema = z.object({
  id: z.string().uuid(),
  to: z.array(z.string()),
  subject: z.string(),
  attempts: z.number().int().nonnegative(),
  lastError: z.string().nullable(),
  createdAt: isoDateSchema,
});
export type FailedMail = z.infer<typeof failedMailSchema>;

/** GET /api/admin/mail/failed */
export const failedMailListSchema = z.object({ items: z.array(failedMailSchema) });
export type FailedMailList = z.infer<typeof failedMailListSchema>;
