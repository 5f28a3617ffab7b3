import { z } from 'zod';
import { singleLineText } from '../text/plain-text.js';
import { revisionStateSchema, sheetTypeIdSchema } from '../revisions/evaluation.schema.js';
import { revisionSummarySchema } from '../revisions/revision.schema.js';
import { isoDateSchema, personRefSchema } from './person-ref.schema.js';

export const sheetSortKeys = ['documentNumber', 'title', 'updatedAt', 'state'] as const;

/** GET /api/sheets query. Unknown parameters are refused. */
export const sheetListQuerySchema = z
  .object({
    q: z.string().trim().max(100).optional(),
    state: revisionStateSchema.optional(),
    siteId: z.string().uuid().optional(),
    machineId: z.string().uuid().optional(),
    sheetType: sheetTypeIdSchema.optional(),
    ownerId: z.string().uuid().optional(),
    page: z.coerce.number().int().min(1).default(1),
    pageSize: z.coerce.number().int().min(1).max(200).default(25),
    sort: z.enum(sheetSortKeys).default('documentNumber'),
    order: z.enum(['asc', 'desc']).default('asc'),
  })
  .strict();
export type SheetListQuery = z.infer<typeof sheetListQuerySchema>;

export const sheetSummarySchema = z.object({
  id: z.string().uuid(),
  documentNumber: z.string(),
  title: z.string(),
  sheetType: sheetTypeIdSchema,
  site: z.object({ id: z.string().uuid(), code: z.string(), name: z.string() }),
  machine: z.object({ id: z.string().uuid(), tag: z.string(), name: z.string() }),
  position: z.object({ id: z.string().uuid(), tag: z.string(), description: z.string() }),
  owner: personRefSchema,
  latest: z.object({ id: z.string().uuid(), label: z.string(), state: revisionStateSchema }),
  approved: z
    .object({ id: z.string().uuid(), label: z.string(), approvedAt: isoDateSchema })
    .nullable(),
  updatedAt: isoDateSchema,
});
export type SheetSummary = z.infer<typeof sheetSummarySchema>;

export const sheetListSchema = z.object({
  items: z.array(sheetSummarySchema),
  total: z.number().int().nonnegative(),
  page: z.number().int().positive(),
  pageSize: z.number().int().positive(),
});
export type SheetList = z.infer<typeof sheetListSchema>;

export const sheetDetailSchema = sheetSummarySchema.extend({
  criteriaSetId: z.string(),
  /** Oldest first (A, B, C …). */
  revisions: z.array(revisionSummarySchema),
});
export type SheetDetail = z.infer<typeof sheetDetailSchema>;

/**
 * How a new sheet starts: blank (required fields empty until entered), the example duty (every
 * value marked until confirmed), or a copy of an approved revision (every value marked too).
 */
export const sheetStartSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('empty') }).strict(),
  z.object({ kind: z.literal('example') }).strict(),
  z.object({ kind: z.literal('copy'), revisionId: z.string().uuid() }).strict(),
]);
export type SheetStart = z.infer<typeof sheetStartSchema>;

/** POST /api/sheets */
export const createSheetSchema = z
  .object({
    title: singleLineText({ min: 3, max: 200 }),
    positionId: z.string().uuid(),
    sheetType: sheetTypeIdSchema,
    criteriaSetId: z.string().min(1).max(80).optional(),
    /** Omitted: the example duty unmarked (older API clients); the app always says. */
    start: sheetStartSchema.optional(),
  })
  .strict();
export type CreateSheetInput = z.infer<typeof createSheetSchema>;

/** GET /api/sheets/:id/compare query. */
export const compareQuerySchema = z
  .object({ from: z.string().uuid(), to: z.string().uuid() })
  .strict();
export type CompareQuery = z.infer<typeof compareQuerySchema>;

const checkStateSchema = z.object({
  value: z.number(),
  utilisation: z.number(),
  pass: z.boolean(),
});

export const compareSchema = z.object({
  from: revisionSummarySchema,
  to: revisionSummarySchema,
  /** Only inputs that differ; `from`/`to` are the stored values with their units (null = absent). */
  inputs: z.array(
    z.object({ key: z.string(), label: z.string(), from: z.unknown(), to: z.unknown() }),
  ),
  /** Results that moved; null on a side without an evaluation. */
  results: z.array(
    z.object({
      key: z.string(),
      label: z.string(),
      unit: z.string(),
      from: z.number().nullable(),
      to: z.number().nullable(),
      delta: z.number().nullable(),
      deltaPct: z.number().nullable(),
      /** The calc dimension, so a client can show the values in the user's units. */
      dimension: z.string().optional(),
    }),
  ),
  checks: z.array(
    z.object({
      id: z.string(),
      label: z.string(),
      from: checkStateSchema.nullable(),
      to: checkStateSchema.nullable(),
    }),
  ),
});
export type Compare = z.infer<typeof compareSchema>;

export const auditEventSchema = z.object({
  id: z.string().uuid(),
  at: isoDateSchema,
  actor: personRefSchema.nullable(),
  action: z.string(),
  entity: z.string(),
  entityId: z.string(),
  before: z.unknown().nullable(),
  after: z.unknown().nullable(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;
export const auditListSchema = z.object({ items: z.array(auditEventSchema) });
export type AuditList = z.infer<typeof auditListSchema>;
