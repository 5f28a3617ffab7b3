import { z } from 'zod';
import type { ResolvedInput, SheetEvaluation, SheetInputs } from '@holdfast/calc';
// The dependency-free ids module: the API schemas derive from calc without loading the core.
import { DIMENSION_IDS, SHEET_TYPE_IDS } from '@holdfast/calc/ids';
import { fieldToleranceSchema } from '../field-records/tolerance.schema.js';

/** Sheet types of the calc registry, taken from calc. */
export const sheetTypeIds = SHEET_TYPE_IDS;
export const sheetTypeIdSchema = z.enum(sheetTypeIds);
export type SheetTypeId = z.infer<typeof sheetTypeIdSchema>;

export const revisionStates = ['draft', 'in_check', 'returned', 'approved', 'superseded'] as const;
export const revisionStateSchema = z.enum(revisionStates);
export type RevisionState = z.infer<typeof revisionStateSchema>;

export const unitSystemSchema = z.enum(['SI', 'US']);

export const quantitySchema = z
  .object({ value: z.number().finite(), unit: z.string().min(1, 'must name a unit') })
  .strict();

/**
 * Why a typed input has none of the accepted shapes, in words a client can act on: a union's
 * default ("Invalid input") does not say which part of `{ value, unit }` was wrong.
 */
export function inputShapeProblem(input: unknown): string {
  const example = 'e.g. { "value": 9000, "unit": "kg" }';
  if (typeof input === 'number') return 'must be a finite number';
  if (input === null || typeof input !== 'object' || Array.isArray(input)) {
    return `must be a number, a choice, yes/no, or a value with its unit (${example})`;
  }
  const o = input as Record<string, unknown>;
  const extra = Object.keys(o).filter((k) => k !== 'value' && k !== 'unit');
  if (extra.length > 0) {
    const names = extra.map((k) => `"${k}"`).join(', ');
    return `a value with its unit has only "value" and "unit", not ${names}`;
  }
  if (typeof o.value !== 'number' || !Number.isFinite(o.value)) {
    return `"value" must be a finite number (${example})`;
  }
  return `"unit" must name a unit (${example})`;
}

export const inputValueSchema = z.union(
  [quantitySchema, z.number().finite(), z.string(), z.boolean()],
  { error: (issue) => inputShapeProblem(issue.input) },
);

/**
 * A sheet's inputs exactly as typed. The shape per field is checked by the calc core on submit
 * (and on save, as a preview), which names the offending field.
 */
export const sheetInputsSchema: z.ZodType<SheetInputs> = z
  .record(
    z
      .string()
      .regex(/^[A-Za-z][A-Za-z0-9_]*$/, 'not a field key')
      .max(80),
    inputValueSchema,
  )
  .refine((r) => Object.keys(r).length <= 500, 'too many fields');

const dimension = z.enum(DIMENSION_IDS);

const resolvedInputSchema: z.ZodType<ResolvedInput> = z.object({
  key: z.string(),
  entered: inputValueSchema,
  si: z.union([z.number(), z.string(), z.boolean()]),
  siUnit: z.string(),
});

const derivationStepSchema = z.object({
  id: z.string(),
  section: z.string(),
  label: z.string(),
  symbol: z.string(),
  formula: z.string(),
  substituted: z.string(),
  value: z.number(),
  unit: z.string(),
  dimension,
  reference: z.string(),
});
const resultValueSchema = z.object({
  key: z.string(),
  section: z.string(),
  label: z.string(),
  symbol: z.string(),
  value: z.number(),
  unit: z.string(),
  dimension,
});
export const checkResultSchema = z.object({
  id: z.string(),
  section: z.string(),
  label: z.string(),
  value: z.number(),
  limit: z.number(),
  unit: z.string(),
  dimension,
  kind: z.enum(['max', 'min']),
  utilisation: z.number(),
  pass: z.boolean(),
  source: z.string(),
  message: z.string(),
});
const chartSchema = z.object({
  id: z.string(),
  title: z.string(),
  xLabel: z.string(),
  xUnit: z.string(),
  xDimension: dimension,
  yLabel: z.string(),
  yUnit: z.string(),
  yDimension: dimension,
  series: z.array(
    z.object({ name: z.string(), points: z.array(z.object({ x: z.number(), y: z.number() })) }),
  ),
  markers: z.array(z.object({ label: z.string(), x: z.number(), y: z.number() })).optional(),
  referenceLines: z
    .array(z.object({ label: z.string(), axis: z.enum(['x', 'y']), value: z.number() }))
    .optional(),
});

/**
 * `SheetEvaluation` of @holdfast/calc, for parsing responses. Always computed by the server. Typed
 * against calc's interface (no cast), so a field calc adds or changes fails to compile here.
 */
export const sheetEvaluationSchema: z.ZodType<SheetEvaluation> = z.object({
  sheetType: z.string(),
  coreVersion: z.string(),
  criteriaSetId: z.string(),
  criteriaSetVersion: z.number().int(),
  results: z.array(resultValueSchema),
  checks: z.array(checkResultSchema),
  derivation: z.array(derivationStepSchema),
  charts: z.array(chartSchema),
  fieldSettings: z.array(
    z.object({
      key: z.string(),
      label: z.string(),
      value: z.number(),
      unit: z.string(),
      dimension,
      note: z.string().optional(),
      tolerance: fieldToleranceSchema.optional(),
    }),
  ),
  tables: z.array(
    z.object({
      id: z.string(),
      title: z.string(),
      columns: z.array(
        z.object({ key: z.string(), label: z.string(), unit: z.string(), dimension }),
      ),
      rows: z.array(z.record(z.string(), z.number())),
    }),
  ),
  warnings: z.array(z.string()),
  pass: z.boolean(),
  criteriaUsed: z.array(z.string()).optional(),
  resolvedInputs: z.array(resolvedInputSchema).optional(),
  settingBands: z
    .array(
      z.object({
        tableId: z.string(),
        set: z.number(),
        failing: z.array(z.array(z.string())),
        low: z.number(),
        high: z.number(),
        lowLimitedBy: z.array(z.string()).nullable(),
        highLimitedBy: z.array(z.string()).nullable(),
      }),
    )
    .optional(),
});
