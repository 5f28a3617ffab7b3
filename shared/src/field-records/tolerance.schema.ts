import type { FieldTolerance, ToleranceBand, ToleranceVerdict } from '@holdfast/calc';
import { CONFIDENCE_LEVELS } from '@holdfast/calc/ids';
import { z } from 'zod';

/** calc's `ToleranceBand` as JSON: bounds in the setting's SI unit, or a fraction of the target. */
export const toleranceBandSchema: z.ZodType<ToleranceBand> = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('absolute'), minus: z.number(), plus: z.number() }),
  z.object({ kind: z.literal('relative'), minus: z.number(), plus: z.number() }),
  z.object({ kind: z.literal('atLeast') }),
  z.object({ kind: z.literal('atMost') }),
]);

/** calc's `FieldTolerance` as JSON. */
export const fieldToleranceSchema: z.ZodType<FieldTolerance> = z.object({
  band: toleranceBandSchema,
  source: z.string(),
  confidence: z.enum(CONFIDENCE_LEVELS),
  rule: z.string().optional(),
  direction: z.enum(['loosen', 'tighten']).optional(),
});

/** calc's `ToleranceVerdict` as JSON. */
export const toleranceVerdictSchema: z.ZodType<ToleranceVerdict> = z.object({
  status: z.enum(['in', 'out']),
  deviationSI: z.number(),
  lowerSI: z.number().nullable(),
  upperSI: z.number().nullable(),
  display: z.object({
    unit: z.string(),
    label: z.string(),
    deviation: z.number(),
    lower: z.number().nullable(),
    upper: z.number().nullable(),
  }),
});
