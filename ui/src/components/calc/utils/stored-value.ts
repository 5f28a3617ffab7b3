/** A stored input as typed: a quantity with its unit, a choice, a number or a flag. */
export function showStoredValue(v: unknown): string {
  if (v === null || v === undefined) return '—';
  if (typeof v === 'object' && 'value' in (v as object) && 'unit' in (v as object)) {
    const q = v as { value: unknown; unit: unknown };
    return `${String(q.value)} ${String(q.unit)}`;
  }
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  return String(v);
}
