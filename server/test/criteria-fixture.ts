import type { CriterionValue } from '@holdfast/calc';

/**
 * A stricter version of a set that stays inside every criterion's bounds: a p·v limit no lining
 * sheet would state and the largest torque factors, so the demo inputs fail under it.
 */
export function stricterValues(values: readonly CriterionValue[]): CriterionValue[] {
  return values.map((v) =>
    v.key === 'pvLimit'
      ? { ...v, value: 1e4 }
      : v.key.startsWith('torqueFactor')
        ? { ...v, value: 5 }
        : { ...v },
  );
}
