import { z } from 'zod';
import { isoDateSchema } from '../sheets/person-ref.schema.js';

/**
 * GET /api/revisions/:id/changes — what changed in the inputs since the last submission the
 * checker saw: an earlier submission of the same revision (before it was returned), else the
 * revision it was started from.
 */
export const revisionChangesSchema = z.object({
  /** What the inputs are compared with; null when there is nothing earlier (a first revision). */
  since: z
    .object({
      kind: z.enum(['submission', 'revision']),
      /** Label of the revision compared with. */
      label: z.string(),
      at: isoDateSchema,
    })
    .nullable(),
  /** Only inputs that differ; `from`/`to` are stored values with their units (null = absent). */
  inputs: z.array(
    z.object({ key: z.string(), label: z.string(), from: z.unknown(), to: z.unknown() }),
  ),
  changeNote: z.object({ from: z.string(), to: z.string() }).nullable(),
});
export type RevisionChanges = z.infer<typeof revisionChangesSchema>;
