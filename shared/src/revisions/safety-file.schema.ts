import { z } from 'zod';

/** POST /api/print/safety-file — approved revisions to print as one PDF, in this order. */
export const safetyFileSchema = z
  .object({
    revisionIds: z
      .array(z.string().uuid())
      .min(1, 'choose at least one approved sheet')
      .max(50, 'at most 50 sheets in one file'),
    paper: z.enum(['A4', 'LETTER']).default('A4'),
  })
  .strict();
export type SafetyFileInput = z.infer<typeof safetyFileSchema>;
