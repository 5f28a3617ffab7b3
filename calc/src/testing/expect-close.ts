/** True when a and b agree within relTol (relative) or absTol (absolute). */
export function nearlyEqual(a: number, b: number, relTol = 1e-9, absTol = 0): boolean {
  if (!Number.isFinite(a) || !Number.isFinite(b)) return false;
  const diff = Math.abs(a - b);
  return diff <= absTol || diff <= relTol * Math.max(Math.abs(a), Math.abs(b));
}

/** Throws with both values when they do not agree; for use inside tests. */
export function expectClose(actual: number, expected: number, relTol = 1e-9, absTol = 0): void {
  if (!nearlyEqual(actual, expected, relTol, absTol)) {
    throw new Error(`expected ${expected} ± ${relTol} rel / ${absTol} abs, got ${actual}`);
  }
}
