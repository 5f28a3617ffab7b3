import { z } from 'zod';
import { multiLineText } from '../text/plain-text.js';
import { isoDateSchema, personRefSchema } from '../sheets/person-ref.schema.js';
import {
  revisionStateSchema,
  sheetEvaluationSchema,
  sheetInputsSchema,
  sheetTypeIdSchema,
  unitSystemSchema,
} from './evaluation.schema.js';

/** One line of a sheet's revision history. */
export const revisionSummarySchema = z.object({
  id: z.string().uuid(),
  label: z.string(),
  state: revisionStateSchema,
  author: personRefSchema,
  checker: personRefSchema.nullable(),
  changeNote: z.string(),
  createdAt: isoDateSchema,
  submittedAt: isoDateSchema.nullable(),
  approvedAt: isoDateSchema.nullable(),
  returnedAt: isoDateSchema.nullable(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

/** GET /api/revisions/:id — a revision with what the caller may do with it. */
export const revisionSchema = revisionSummarySchema.extend({
  sheetId: z.string().uuid(),
  sheetType: sheetTypeIdSchema,
  documentNumber: z.string(),
  inputs: sheetInputsSchema,
  unitSystem: unitSystemSchema,
  criteriaSetId: z.string(),
  criteriaSetVersion: z.number().int().positive(),
  /** Computed by the server: on submit (frozen) or as a preview on save of a draft. */
  evaluation: sheetEvaluationSchema.nullable(),
  coreVersion: z.string().nullable(),
  /** SHA-256 (hex) over canonical JSON of inputs and evaluation; set on submit. */
  hash: z.string().nullable(),
  /** Short code printed on the sheet; set on submit. */
  verificationCode: z.string().nullable(),
  /** Why the revision was submitted with failing checks. */
  justification: z.string().nullable(),
  /** Fields still holding an example, copied or default value nobody confirmed for this brake. */
  unconfirmed: z.array(z.string()).default([]),
  /** The checker's note on approval; printed in the approvals table. */
  approvalNote: z.string().nullable(),
  rowVersion: z.number().int().nonnegative(),
  supersededBy: z
    .object({ id: z.string().uuid(), label: z.string(), at: isoDateSchema })
    .nullable(),
  canEdit: z.boolean(),
  canSubmit: z.boolean(),
  canCheck: z.boolean(),
});
export type Revision = z.infer<typeof revisionSchema>;

const rowVersion = z.number().int().nonnegative();

/** PUT /api/revisions/:id — draft save. */
export const saveRevisionSchema = z
  .object({
    inputs: sheetInputsSchema,
    unitSystem: unitSystemSchema,
    changeNote: multiLineText({ max: 2000 }),
    criteriaSetId: z.string().min(1).max(80).optional(),
    /**
     * The fields the author has not yet confirmed. It can only shrink: the server keeps a key
     * only if it was unconfirmed before and its value did not change.
     */
    unconfirmed: z.array(z.string().max(80)).max(500).optional(),
    rowVersion,
  })
  .strict();
export type SaveRevisionInput = z.infer<typeof saveRevisionSchema>;

/** POST /api/revisions/:id/submit */
export const submitRevisionSchema = z
  .object({
    rowVersion,
    justification: multiLineText({ max: 4000 }).optional(),
  })
  .strict();
export type SubmitRevisionInput = z.infer<typeof submitRevisionSchema>;

/** POST /api/revisions/:id/approve */
export const approveRevisionSchema = z
  .object({ rowVersion, note: multiLineText({ max: 4000 }).optional() })
  .strict();
export type ApproveRevisionInput = z.infer<typeof approveRevisionSchema>;

/** POST /api/revisions/:id/return — the comment is stored as a comment on the revision. */
export const returnRevisionSchema = z
  .object({
    rowVersion,
    comment: multiLineText({ min: 1, max: 4000, minMessage: 'say what must change' }),
  })
  .strict();
export type ReturnRevisionInput = z.infer<typeof returnRevisionSchema>;

/** POST /api/sheets/:id/revisions */
export const newRevisionSchema = z
  .object({
    changeNote: multiLineText({ min: 1, max: 2000, minMessage: 'say why the sheet changes' }),
  })
  .strict();
export type NewRevisionInput = z.infer<typeof newRevisionSchema>;

const movedResultSchema = z.object({
  key: z.string(),
  label: z.string(),
  unit: z.string(),
  then: z.number(),
  now: z.number(),
  delta: z.number(),
});

const checkStateSchema = z.object({
  value: z.number(),
  utilisation: z.number(),
  pass: z.boolean(),
});

/** POST /api/revisions/:id/drift */
export const driftReportSchema = z.object({
  coreVersionThen: z.string(),
  coreVersionNow: z.string(),
  /** Results whose relative change exceeds 1e-9. */
  moved: z.array(movedResultSchema),
  checksChanged: z.array(
    z.object({
      id: z.string(),
      label: z.string(),
      then: checkStateSchema.nullable(),
      now: checkStateSchema.nullable(),
    }),
  ),
  /** Set when the stored inputs no longer evaluate with today's core. */
  error: z.string().nullable().optional(),
  /**
   * The same inputs against the newest version of the criteria set, when the revision used an
   * older one: the checks that fail under it (empty when all pass).
   */
  newestCriteria: z
    .object({
      criteriaSetId: z.string(),
      versionThen: z.number().int().positive(),
      versionNow: z.number().int().positive(),
      failing: z.array(z.object({ id: z.string(), label: z.string() })),
      error: z.string().nullable(),
    })
    .nullable()
    .optional(),
});
export type DriftReport = z.infer<typeof driftReportSchema>;

/** Query of GET /api/revisions/:id/pdf and /field-card. */
export const printQuerySchema = z.object({ paper: z.enum(['A4', 'LETTER']).default('A4') });
export type PrintQuery = z.infer<typeof printQuerySchema>;
