import { z } from 'zod';
import { isoDateSchema } from '../sheets/person-ref.schema.js';
import { fieldRecordKindSchema, fieldSignatureSchema } from './field-record.schema.js';

/**
 * PUT /api/register/positions/:positionId/inspection-interval. An interval in days, or in
 * operating hours (the next due reading counts from the last record's meter reading). Reminders
 * go out `remindDaysAhead` days before the due date (days intervals only).
 */
export const inspectionIntervalSchema = z.discriminatedUnion('basis', [
  z
    .object({
      basis: z.literal('days'),
      every: z.number().int().min(1).max(3660),
      remindDaysAhead: z.number().int().min(0).max(90).default(7),
    })
    .strict(),
  z
    .object({
      basis: z.literal('hours'),
      every: z.number().int().min(1).max(100_000),
      remindDaysAhead: z.number().int().min(0).max(90).default(7),
    })
    .strict(),
]);
export type InspectionInterval = z.infer<typeof inspectionIntervalSchema>;

/** GET of the same path: the interval, or null when none is set. */
export const positionIntervalSchema = z.object({
  positionId: z.string().uuid(),
  interval: inspectionIntervalSchema.nullable(),
});
export type PositionInterval = z.infer<typeof positionIntervalSchema>;

/** When the next inspection of a position is due. */
export const nextDueSchema = z.object({
  /** Due date (days basis), null for hours basis or no interval. */
  date: isoDateSchema.nullable(),
  /** Meter reading due (hours basis), null otherwise. */
  meterHours: z.number().nullable(),
  overdue: z.boolean(),
});
export type NextDue = z.infer<typeof nextDueSchema>;

/**
 * GET /api/register/positions/:positionId/field-state — the brake at a glance: which revision it
 * was last set to, when it was last inspected, when the next inspection is due, open findings.
 */
export const positionFieldStateSchema = z.object({
  positionId: z.string().uuid(),
  setTo: z
    .object({
      revisionId: z.string().uuid(),
      documentNumber: z.string(),
      revisionLabel: z.string(),
      recordId: z.string().uuid(),
      performedAt: isoDateSchema,
      /** The revision set is no longer the approved one in force. */
      superseded: z.boolean(),
    })
    .nullable(),
  lastInspected: z
    .object({
      recordId: z.string().uuid(),
      performedAt: isoDateSchema,
      kind: fieldRecordKindSchema,
    })
    .nullable(),
  interval: inspectionIntervalSchema.nullable(),
  nextDue: nextDueSchema.nullable(),
  /** Records not yet countersigned, or signed with as-left values out of tolerance. */
  openFindings: z.array(
    z.object({
      recordId: z.string().uuid(),
      performedAt: isoDateSchema,
      summary: z.string(),
      signed: fieldSignatureSchema.nullable(),
    }),
  ),
});
export type PositionFieldState = z.infer<typeof positionFieldStateSchema>;

/** One position in the due list. */
export const dueInspectionSchema = z.object({
  positionId: z.string().uuid(),
  positionTag: z.string(),
  machineTag: z.string(),
  siteCode: z.string(),
  lastInspectedAt: isoDateSchema.nullable(),
  nextDue: nextDueSchema,
});
export type DueInspection = z.infer<typeof dueInspectionSchema>;

/**
 * GET /api/field-records/due — positions due within the reminder window and overdue ones.
 */
export const dueInspectionsSchema = z.object({
  due: z.array(dueInspectionSchema),
  overdue: z.array(dueInspectionSchema),
  /** Signed records waiting for the signed-in plant engineer's (or engineer's) countersignature. */
  awaitingCountersign: z.array(
    z.object({
      recordId: z.string().uuid(),
      positionId: z.string().uuid(),
      positionTag: z.string(),
      machineTag: z.string(),
      siteCode: z.string(),
      performedAt: isoDateSchema,
      outOfTolerance: z.boolean(),
    }),
  ),
});
export type DueInspections = z.infer<typeof dueInspectionsSchema>;
