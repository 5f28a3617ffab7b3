import type { SheetEvaluation } from '@holdfast/calc';

/** Labels of the checks a frozen evaluation fails (none without an evaluation). */
export function failingLabels(evaluation: unknown): string[] {
  const checks = (evaluation as Pick<SheetEvaluation, 'checks'> | null)?.checks ?? [];
  return checks.filter((c) => !c.pass).map((c) => c.label);
}

/** The error's summary when an approval needs a note: what is open or failing. */
export function approvalNoteSummary(open: number, failing: readonly string[]): string {
  const parts = [
    ...(open > 0 ? ['comments are still open'] : []),
    ...(failing.length > 0 ? ['checks fail'] : []),
  ];
  return `${capitalise(parts.join(' and '))}: say in the note why you approve.`;
}

/**
 * Why the approval note is required, for the note field: the open comments (resolve them first,
 * or say why) and the failing checks by name (the author's justification is on the revision; the
 * checker signs the sheet with them failing, so says why too).
 */
export function approvalNoteReason(open: number, failing: readonly string[]): string {
  const reasons: string[] = [];
  if (open > 0) {
    const one = open === 1;
    reasons.push(
      `${one ? 'one comment is' : `${open} comments are`} still open: resolve ${one ? 'it' : 'them'} first, or say why this revision is approved with ${one ? 'it' : 'them'} open`,
    );
  }
  if (failing.length > 0) {
    reasons.push(
      `${failing.length === 1 ? 'one check fails' : `${failing.length} checks fail`} (${failing.join('; ')}): say why this revision is approved with ${failing.length === 1 ? 'it' : 'them'} failing`,
    );
  }
  return `required because ${reasons.join('; and ')}`;
}

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
