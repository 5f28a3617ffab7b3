import { z } from 'zod';
import { isoDateSchema, personRefSchema } from '../sheets/person-ref.schema.js';
import { multiLineText } from '../text/plain-text.js';

/** A check that fails when an approved revision is evaluated under a newer criteria version. */
export const reviewFailingCheckSchema = z.object({
  id: z.string(),
  label: z.string(),
  value: z.number(),
  limit: z.number(),
  unit: z.string(),
});

/**
 * "Under review": an annotation beside an approved revision (never an edit of it) saying that a
 * newer criteria-set version makes it fail. Cleared by a newer approval or a checker's disposition.
 */
export const criteriaReviewSchema = z.object({
  id: z.string().uuid(),
  revisionId: z.string().uuid(),
  sheetId: z.string().uuid(),
  criteriaSetId: z.string(),
  criteriaSetName: z.string(),
  criteriaSetVersion: z.number().int().positive(),
  failing: z.array(reviewFailingCheckSchema),
  flaggedAt: isoDateSchema,
  clearedAt: isoDateSchema.nullable(),
  clearedHow: z.enum(['superseded', 'disposition']).nullable(),
  clearedBy: personRefSchema.nullable(),
  disposition: z.string().nullable(),
});
export type CriteriaReview = z.infer<typeof criteriaReviewSchema>;

/** GET /api/revisions/:id/criteria-review: the open flag (if any) and the cleared ones. */
export const revisionCriteriaReviewSchema = z.object({
  open: criteriaReviewSchema.nullable(),
  cleared: z.array(criteriaReviewSchema),
  /** Whether the caller may write a disposition of the open flag. */
  canDispose: z.boolean(),
});
export type RevisionCriteriaReview = z.infer<typeof revisionCriteriaReviewSchema>;

/** POST /api/revisions/:id/criteria-review/disposition (checker). */
export const reviewDispositionSchema = z
  .object({
    disposition: multiLineText({
      min: 10,
      max: 4000,
      minMessage: 'say why the approved revision stands (at least 10 characters)',
    }),
  })
  .strict();
export type ReviewDispositionInput = z.infer<typeof reviewDispositionSchema>;

/** GET /api/work-queue/under-review: approved revisions under review that I own or checked. */
export const underReviewQueueSchema = z.object({
  items: z.array(
    z.object({
      sheetId: z.string().uuid(),
      documentNumber: z.string(),
      title: z.string(),
      revisionId: z.string().uuid(),
      revisionLabel: z.string(),
      criteriaSetName: z.string(),
      criteriaSetVersion: z.number().int().positive(),
      flaggedAt: isoDateSchema,
    }),
  ),
});
export type UnderReviewQueue = z.infer<typeof underReviewQueueSchema>;
