import { z } from 'zod';

/** A person as the sheets API shows them: enough to name and badge, never an e-mail. */
export const personRefSchema = z.object({
  id: z.string().uuid(),
  displayName: z.string(),
  initials: z.string(),
});
export type PersonRef = z.infer<typeof personRefSchema>;

/** An ISO 8601 timestamp as JSON carries it (`Date.prototype.toJSON`). */
export const isoDateSchema = z.string();
