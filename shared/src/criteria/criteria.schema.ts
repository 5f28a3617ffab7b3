import { criteriaValueProblems } from '@holdfast/calc';
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

/**
 * A list of criterion values that an engineer can stand behind: known keys, each once, in its
 * declared unit and inside its bounds (calc's criteria catalogue), and a value marked "from
 * memory" only while its source still says so.
 */
export const criterionValuesSchema = z
  .array(criterionValueSchema)
  .min(1)
  .superRefine((values, ctx) => {
    for (const problem of criteriaValueProblems(values)) {
      ctx.addIssue({
        code: 'custom',
        path: problem.field.split('.').map((p) => (/^\d+$/.test(p) ? Number(p) : p)),
        message: problem.message,
      });
    }
    values.forEach((v, i) => {
      if (v.confidence === 'memory' && !/memory/i.test(v.source)) {
        ctx.addIssue({
          code: 'custom',
          path: [i, 'confidence'],
          message:
            'the source no longer says the value is from memory: say how sure it is (published, secondary, common practice)',
        });
      }
    });
  });

/** POST /api/criteria-sets/:id/versions (admin). Every key of the set must be present. */
export const publishCriteriaVersionSchema = z
  .object({
    values: criterionValuesSchema,
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
        }),
      ),
    }),
  ),
});
export type ImpactReport = z.infer<typeof impactReportSchema>;
