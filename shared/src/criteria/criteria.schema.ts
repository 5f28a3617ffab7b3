import { criteriaValueProblems, REQUIRED_CRITERIA } from '@holdfast/calc';
import { CONFIDENCE_LEVELS } from '@holdfast/calc/ids';
import { z } from 'zod';
import { multiLineText, singleLineText } from '../text/plain-text.js';
import { isoDateSchema, personRefSchema } from '../sheets/person-ref.schema.js';

export const criterionValueSchema = z
  .object({
    key: z.string().min(1).max(80),
    label: singleLineText({ min: 1, max: 200 }),
    value: z.number().finite(),
    unit: singleLineText({ max: 40 }),
    source: singleLineText({
      min: 1,
      max: 400,
      minMessage: 'name the source, or say "common practice"',
    }),
    confidence: z.enum(CONFIDENCE_LEVELS),
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

/**
 * A value confirmed against a document the plant holds. It replaces "from memory" on screen and
 * on paper for as long as the value stays what was confirmed.
 */
export const criterionConfirmationSchema = z.object({
  key: z.string(),
  /** The version the confirmation was made on (it may be older than the one shown). */
  version: z.number().int().positive(),
  document: z.string(),
  clause: z.string(),
  confirmedAt: isoDateSchema,
  confirmedBy: personRefSchema,
});
export type CriterionConfirmation = z.infer<typeof criterionConfirmationSchema>;

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
  /** Confirmations that hold for this version's values, one per key at most. */
  confirmations: z.array(criterionConfirmationSchema),
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
    note: multiLineText({ min: 1, max: 2000, minMessage: 'say what changed and why' }),
  })
  .strict();
export type PublishCriteriaVersionInput = z.infer<typeof publishCriteriaVersionSchema>;

/** POST /api/criteria-sets (admin): a new set, e.g. the plant's own standard, as version 1. */
export const createCriteriaSetSchema = z
  .object({
    id: z
      .string()
      .trim()
      .regex(/^[a-z0-9][a-z0-9-]{2,59}$/, 'lower-case letters, digits and hyphens, 3 to 60'),
    name: singleLineText({ min: 3, max: 200, minMessage: 'name the set' }),
    description: multiLineText({
      min: 10,
      max: 2000,
      minMessage: 'say what the set is for and which standard governs',
    }),
    values: criterionValuesSchema.superRefine((values, ctx) => {
      for (const key of REQUIRED_CRITERIA) {
        if (!values.some((v) => v.key === key))
          ctx.addIssue({ code: 'custom', path: [], message: `value "${key}" is missing` });
      }
    }),
    note: multiLineText({ min: 1, max: 2000, minMessage: 'say where the values come from' }),
  })
  .strict();
export type CreateCriteriaSetInput = z.infer<typeof createCriteriaSetSchema>;

/** POST /api/criteria-sets/:id/versions/:version/confirmations (admin, checker). */
export const confirmCriterionSchema = z
  .object({
    key: z.string().min(1).max(80),
    document: singleLineText({
      min: 3,
      max: 300,
      minMessage: 'name the document the plant holds (title, number, edition)',
    }),
    clause: singleLineText({ min: 1, max: 120, minMessage: 'name the clause, table or page' }),
  })
  .strict();
export type ConfirmCriterionInput = z.infer<typeof confirmCriterionSchema>;

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
