import { evaluateTolerance, fieldTolerances } from '@holdfast/calc';
import { describe, expect, it } from 'vitest';
import { fieldToleranceSchema, toleranceVerdictSchema } from './tolerance.schema.js';

describe('tolerance schemas', () => {
  it('carry every tolerance calc declares, and its verdict, unchanged', () => {
    for (const t of Object.values(fieldTolerances)) {
      expect(fieldToleranceSchema.parse(structuredClone(t))).toEqual(t);
      const verdict = evaluateTolerance(0.2, 0.2004, t, 'length');
      expect(toleranceVerdictSchema.parse(structuredClone(verdict))).toEqual(verdict);
    }
  });

  it('refuse a confidence calc does not know', () => {
    const bad = { ...fieldTolerances.SPRING_LENGTH, confidence: 'hearsay' };
    expect(fieldToleranceSchema.safeParse(bad).success).toBe(false);
  });
});
