import type { CriterionValue } from '@holdfast/calc';
import type { CriterionConfirmation } from '@holdfast/shared';

export interface ConfirmationRow {
  key: string;
  version: number;
  document: string;
  clause: string;
  confirmedAt: Date;
  userId: string;
  displayName: string;
  initials: string;
}

/**
 * The confirmations that hold for one version: per key, the newest confirmation made on this
 * version or an earlier one whose value is the same as this version's. A changed value needs a
 * new confirmation; an unchanged one keeps its document across versions.
 */
export function confirmationsFor(
  version: number,
  versions: readonly { version: number; values: readonly CriterionValue[] }[],
  rows: readonly ConfirmationRow[],
): CriterionConfirmation[] {
  const valueAt = (v: number, key: string) =>
    versions.find((x) => x.version === v)?.values.find((x) => x.key === key)?.value;
  const current = versions.find((v) => v.version === version);
  if (!current) return [];
  const out: CriterionConfirmation[] = [];
  for (const value of current.values) {
    const holds = rows.filter(
      (r) =>
        r.key === value.key && r.version <= version && valueAt(r.version, r.key) === value.value,
    );
    const newest = holds.at(-1);
    if (!newest) continue;
    out.push({
      key: newest.key,
      version: newest.version,
      document: newest.document,
      clause: newest.clause,
      confirmedAt: newest.confirmedAt.toISOString(),
      confirmedBy: {
        id: newest.userId,
        displayName: newest.displayName,
        initials: newest.initials,
      },
    });
  }
  return out;
}
