import { isSafetyCaution } from '@holdfast/calc';

/**
 * An evaluation's warnings for the notes box: what this calculation found first, then the usual
 * cautions every sheet carries (the footer repeats the general one), each group in its own order.
 */
export function notesFirst(warnings: readonly string[]): string[] {
  return [
    ...warnings.filter((w) => !isSafetyCaution(w)),
    ...warnings.filter((w) => isSafetyCaution(w)),
  ];
}
