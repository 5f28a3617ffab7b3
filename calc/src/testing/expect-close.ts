/** True when a and b agree within relTol (relative) or absTol (absolute). */
export function nearlyEqual(a: number, b: number, relTol = 1e-9, absTol = 0): boolean {
  if (!Number.isFinite(a) || !Number.isFinite(b)) return false;
  const diff = Math.abs(a - b);
  return diff <= absTol || diff <= relTol * Math.max(Math.abs(a), Math.abs(b));
}
