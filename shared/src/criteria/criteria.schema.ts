import { z } from 'zod';
import { isoDateSchema, personRefSchema } from '../sheets/person-ref.schema.js';

export const criterionValueSchema = z
  .object({
    key: z.string().min(1).max(80),
    label: z.string().min(1).max(200),
    value: z.number().finite(),
    unit: z.string().max(40),
    source: z.string().min(1, 'name the source, or say "common practice"').max(400),
    confidence: z.enum(['published', 'secondary', 'common practice', 'memory']),
  })
  .strict();
export type CriterionValueInput = z.infer<typeof criterionValueSchema>;

export const criteriaSetSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string(),
  /** Latest published version. */
  version: z.number().int().positive(),
  publishedAt: isoDateSchema,
});
export type CriteriaSetSummary = z.infer<typeof criteriaSetSummarySchema>;
export const criteriaSetListSchema = z.object({ items: z.array(criteriaSetSummarySchema) });
export type CriteriaSetList = z.infer<typeof criteriaSetListSchema>;

/** GET /api/criteria-sets/:id?version= — calc's CriteriaSet plus its history. */
export const criteriaSetDetailSchema = z.object({
  id: z.string(),
  version: z.number().int().positive(),
  name: z.string(),
  description: z.string(),
  values: z.array(criterionValueSchema),
  note: z.string().nullable(),
  publishedAt: isoDateSchema,
  publishedBy: personRefSchema.nullable(),
  versions: z.array(z.object({ version: z.number().int().positive(), publishedAt: isoDateSchema })),
});
export type CriteriaSetDetail = z.infer<typeof criteriaSetDetailSchema>;

export const criteriaVersionQuerySchema = z
  .object({ version: z.coerce.number().int().positive().optional() })
  .strict();

/** POST /api/criteria-sets/:id/versions (admin). Every key of the set must be present. */
export const publishCriteriaVersionSchema = z
  .object({
    values: z.array(criterionValueSchema).min(1),
    note: z.string().trim().min(1, 'say what changed and why').max(2000),
  })
  .strict();
export type PublishCriteriaVersionInput = z.infer<typeof publishCriteriaVersionSchema>;

/** GET /api/criteria-sets/:id/impact?version= */
export const impactReportSchema = z.object({
  criteriaSetId: z.string(),
  version: z.number().int().positive(),
  /** Approved revisions evaluated. */
  checked: z.number().int().nonnegative(),
  items: z.array(
    z.object({
      sheetId: z.string().uuid(),
      documentNumber: z.string(),
      title: z.string(),
      revisionId: z.string().uuid(),
      revisionLabel: z.string(),
      failing: z.array(
        z.object({
          id: z.string(),
          label: z.string(),
          value: z.number(),
          limit: z.number(),
          unit: z.string(),
          /** The calc dimension of value and limit (SI `unit`), for display in the user's units. */
          dimension: z.string().optional(),
        }),
      ),
    }),
  ),
});
export type ImpactReport = z.infer<typeof impactReportSchema>;
