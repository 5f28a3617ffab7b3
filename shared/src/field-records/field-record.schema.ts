import { DIMENSION_IDS, FIELD_CARD_GROUPS } from '@holdfast/calc/ids';
import { z } from 'zod';
import { multiLineText, singleLineText } from '../text/plain-text.js';
import { isoDateSchema, personRefSchema } from '../sheets/person-ref.schema.js';
import { fieldToleranceSchema, toleranceVerdictSchema } from './tolerance.schema.js';

/** What the fitters went to the brake for. */
export const fieldRecordKinds = [
  'commissioning',
  'periodic-inspection',
  're-adjustment',
  'lining-replacement',
  'after-repair',
] as const;
export const fieldRecordKindSchema = z.enum(fieldRecordKinds);
export type FieldRecordKind = z.infer<typeof fieldRecordKindSchema>;
/** Each kind of work in words, as the record form, the timeline and the printed record name it. */
export const fieldRecordKindLabels: Readonly<Record<FieldRecordKind, string>> = {
  commissioning: 'Commissioning (first setting)',
  'periodic-inspection': 'Periodic inspection',
  're-adjustment': 'Re-adjustment for lining or pad wear',
  'lining-replacement': 'Lining or pad replacement',
  'after-repair': 'After repair',
};

/** draft → signed (technician) → countersigned (plant engineer; immutable from then on). */
export const fieldRecordStatuses = ['draft', 'signed', 'countersigned'] as const;
export const fieldRecordStatusSchema = z.enum(fieldRecordStatuses);
export type FieldRecordStatus = z.infer<typeof fieldRecordStatusSchema>;

/**
 * The checks a fitter does on every visit, as explicit items. The keys are stored identifiers in
 * drum-brake words (shoes A and B as the field card names them); on a caliper brake the same keys
 * stand for pads A and B, its release unit and the caliper, and the field form's labels say so.
 * An item with no meaning on a brake is answered 'not-applicable'.
 */
export const fieldCheckKeys = [
  'no-drag-shoe-a',
  'no-drag-shoe-b',
  'set-release-cycles',
  'thruster-condition',
  'linkage-condition',
  'lining-thickness-shoe-a',
  'lining-thickness-shoe-b',
] as const;
export const fieldCheckKeySchema = z.enum(fieldCheckKeys);
export type FieldCheckKey = z.infer<typeof fieldCheckKeySchema>;

/** Check items that carry a measured value (SI, metres) besides their result. */
export const fieldCheckKeysWithValue: readonly FieldCheckKey[] = [
  'lining-thickness-shoe-a',
  'lining-thickness-shoe-b',
];

export const fieldCheckResultSchema = z.enum(['ok', 'not-ok', 'not-applicable']);
export type FieldCheckResult = z.infer<typeof fieldCheckResultSchema>;

const finiteNumber = z.number().finite();
/** A reading in SI (m, N, rad, K): a length, force, angle or absolute temperature is never below 0. */
const reading = finiteNumber.min(0, 'a reading cannot be negative');
const reasonText = multiLineText({ max: 2000 });

/** One check item as entered. */
export const fieldCheckInputSchema = z
  .object({
    key: fieldCheckKeySchema,
    result: fieldCheckResultSchema,
    /** Lining thickness in metres (SI) for the lining items; null otherwise. */
    value: finiteNumber.nonnegative().nullable().default(null),
    /** For 'set-release-cycles': how many cycles were run before re-measuring. */
    cycles: z.number().int().min(0).max(1000).nullable().default(null),
    note: multiLineText({ max: 1000 }).default(''),
  })
  .strict();
export type FieldCheckInput = z.infer<typeof fieldCheckInputSchema>;

/**
 * One measured field-card value. Values are SI in the setting's unit (m, N, rad), as calc's field
 * settings are; the UI converts from what the fitter typed. `asFound` is empty on commissioning.
 * `reason` is required (at sign time) when `asLeft` lies outside the tolerance.
 */
export const fieldMeasurementInputSchema = z
  .object({
    settingKey: z.string().min(1).max(80),
    asFound: reading.nullable().default(null),
    asLeft: reading.nullable().default(null),
    reason: reasonText.default(''),
  })
  .strict();
export type FieldMeasurementInput = z.infer<typeof fieldMeasurementInputSchema>;

const measurements = z
  .array(fieldMeasurementInputSchema)
  .max(100)
  .refine((m) => new Set(m.map((x) => x.settingKey)).size === m.length, 'one entry per setting');
const checks = z
  .array(fieldCheckInputSchema)
  .max(fieldCheckKeys.length)
  .refine((c) => new Set(c.map((x) => x.key)).size === c.length, 'one entry per check');
/** Operating-hours meter reading (h), when the position is inspected by hours. */
const meterHours = finiteNumber.nonnegative().max(10_000_000).nullable();

/**
 * POST /api/field-records. `id` is generated on the device: a retried create with the same id
 * returns the stored record (200) instead of a second one (201 the first time).
 */
export const createFieldRecordSchema = z
  .object({
    id: z.string().uuid(),
    positionId: z.string().uuid(),
    revisionId: z.string().uuid(),
    kind: fieldRecordKindSchema,
    performedAt: z.string().datetime({ offset: true }),
    meterHours: meterHours.default(null),
    measurements: measurements.default([]),
    checks: checks.default([]),
    findings: multiLineText({ max: 5000 }).default(''),
  })
  .strict();
export type CreateFieldRecordInput = z.infer<typeof createFieldRecordSchema>;

/** PATCH /api/field-records/:id — drafts only; lists replace the stored lists whole. */
export const updateFieldRecordSchema = z
  .object({
    kind: fieldRecordKindSchema.optional(),
    performedAt: z.string().datetime({ offset: true }).optional(),
    meterHours: meterHours.optional(),
    measurements: measurements.optional(),
    checks: checks.optional(),
    findings: multiLineText({ max: 5000 }).optional(),
  })
  .strict();
export type UpdateFieldRecordInput = z.infer<typeof updateFieldRecordSchema>;

/** POST /api/field-records/:id/sign — the technician signs as themself; nothing else to send. */
export const signFieldRecordSchema = z.object({}).strict();
/** POST /api/field-records/:id/countersign — a plant engineer (engineer or checker, not the signer). */
export const countersignFieldRecordSchema = z
  .object({ note: singleLineText({ max: 500 }).default('') })
  .strict();

/** A target of the field card with its tolerance, as the record form shows it. */
export const fieldTargetSchema = z.object({
  settingKey: z.string(),
  label: z.string(),
  /** Target in SI, in `unit`. */
  value: z.number(),
  unit: z.string(),
  dimension: z.enum(DIMENSION_IDS),
  group: z.enum(FIELD_CARD_GROUPS),
  stack: z.string().optional(),
  role: z.enum(['backOff', 'preload']).optional(),
  note: z.string().optional(),
  /** Null for a value the card prints but nobody measures (e.g. a derived wear allowance). */
  tolerance: fieldToleranceSchema.nullable(),
  /**
   * Where the value may drift to in service before work is due (lining wear uses up the reserve
   * stroke down to the sheet's minimum): an as-found reading is judged against this, the setting's
   * tolerance applies to the value as left.
   */
  inService: z
    .object({ value: z.number(), tolerance: fieldToleranceSchema, label: z.string() })
    .optional(),
});
export type FieldTarget = z.infer<typeof fieldTargetSchema>;

/** GET /api/revisions/:revisionId/field-form — what the record form is generated from. */
export const fieldFormSchema = z.object({
  revisionId: z.string().uuid(),
  sheetId: z.string().uuid(),
  documentNumber: z.string(),
  revisionLabel: z.string(),
  sheetType: z.string(),
  positionId: z.string().uuid().nullable(),
  targets: z.array(fieldTargetSchema),
  checks: z.array(
    z.object({
      key: fieldCheckKeySchema,
      label: z.string(),
      hasValue: z.boolean(),
      /** The sheet's minimum for this value (lining thickness, m), null when it sets none. */
      minimum: z.number().positive().nullable().optional(),
    }),
  ),
});
export type FieldForm = z.infer<typeof fieldFormSchema>;

/** A stored measurement with its target and the verdicts the server computed. */
export const fieldMeasurementSchema = fieldMeasurementInputSchema.extend({
  label: z.string(),
  target: z.number().nullable(),
  unit: z.string(),
  dimension: z.string(),
  tolerance: fieldToleranceSchema.nullable(),
  asFoundVerdict: toleranceVerdictSchema.nullable(),
  asLeftVerdict: toleranceVerdictSchema.nullable(),
});
export type FieldMeasurement = z.infer<typeof fieldMeasurementSchema>;

export const fieldSignatureSchema = z.object({ by: personRefSchema, at: isoDateSchema });

/** A field record as the API returns it. */
export const fieldRecordSchema = z.object({
  id: z.string().uuid(),
  positionId: z.string().uuid(),
  positionTag: z.string(),
  /** The machine and site of the position: tags repeat across machines. */
  machineTag: z.string(),
  siteCode: z.string(),
  revisionId: z.string().uuid(),
  sheetId: z.string().uuid(),
  documentNumber: z.string(),
  revisionLabel: z.string(),
  kind: fieldRecordKindSchema,
  status: fieldRecordStatusSchema,
  performedAt: isoDateSchema,
  meterHours: z.number().nullable(),
  measurements: z.array(fieldMeasurementSchema),
  checks: z.array(fieldCheckInputSchema),
  findings: z.string(),
  /** True when some as-left value is outside its tolerance. */
  outOfTolerance: z.boolean(),
  flags: z.object({
    /** The revision the record was made against has since been superseded by a newer approval. */
    superseded: z.boolean(),
    /** The revision is under review (a newer criteria set makes it fail). */
    underReview: z.boolean(),
  }),
  createdBy: personRefSchema,
  createdAt: isoDateSchema,
  updatedAt: isoDateSchema,
  signed: fieldSignatureSchema.nullable(),
  countersigned: fieldSignatureSchema.nullable(),
  /** Printed on the PDF; set when the record is signed. */
  verificationCode: z.string().nullable(),
});
export type FieldRecord = z.infer<typeof fieldRecordSchema>;

/** One line of a position's timeline (GET list). */
export const fieldRecordSummarySchema = fieldRecordSchema.pick({
  id: true,
  positionId: true,
  positionTag: true,
  machineTag: true,
  siteCode: true,
  revisionId: true,
  documentNumber: true,
  revisionLabel: true,
  kind: true,
  status: true,
  performedAt: true,
  meterHours: true,
  outOfTolerance: true,
  flags: true,
  signed: true,
  countersigned: true,
});
export type FieldRecordSummary = z.infer<typeof fieldRecordSummarySchema>;

/** GET /api/field-records?positionId=&status= */
export const fieldRecordListQuerySchema = z
  .object({
    positionId: z.string().uuid().optional(),
    status: fieldRecordStatusSchema.optional(),
  })
  .strict();
export const fieldRecordListSchema = z.object({ items: z.array(fieldRecordSummarySchema) });
export type FieldRecordList = z.infer<typeof fieldRecordListSchema>;

/**
 * GET /api/register/positions/:positionId/field-records — the full records of a position, oldest
 * first: the timeline and the series the wear trend is fitted to (reserve stroke from the
 * 'reserveStroke' measurement, lining thickness from the lining check items).
 */
export const positionFieldHistorySchema = z.object({
  positionId: z.string().uuid(),
  items: z.array(fieldRecordSchema),
});
export type PositionFieldHistory = z.infer<typeof positionFieldHistorySchema>;
