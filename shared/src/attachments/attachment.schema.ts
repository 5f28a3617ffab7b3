import { z } from 'zod';
import { isoDateSchema, personRefSchema } from '../sheets/person-ref.schema.js';

/** Largest upload accepted (bytes). */
export const MAX_ATTACHMENT_BYTES = 25 * 1024 * 1024;

/** Content types accepted, decided by sniffing the bytes, never by the name. */
export const attachmentContentTypes = [
  'application/pdf',
  'image/png',
  'image/jpeg',
  'text/plain',
  'text/csv',
] as const;

export const attachmentSchema = z.object({
  id: z.string().uuid(),
  revisionId: z.string().uuid(),
  fileName: z.string(),
  contentType: z.enum(attachmentContentTypes),
  size: z.number().int().nonnegative(),
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  uploadedBy: personRefSchema,
  createdAt: isoDateSchema,
});
export type Attachment = z.infer<typeof attachmentSchema>;

export const attachmentListSchema = z.object({ items: z.array(attachmentSchema) });
export type AttachmentList = z.infer<typeof attachmentListSchema>;
