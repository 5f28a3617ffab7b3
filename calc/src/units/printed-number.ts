/** A printed number read back ('−12.5' → -12.5); NaN for exponent notation. */
export const numberOf = (printed: string): number => Number(printed.replace('−', '-'));

/** The value of a printed number's last digit: 0.1 for '220.8', 10 for '1120' at 3 figures. */
export function lastPlace(printed: string, digits: number): number {
  const dot = printed.indexOf('.');
  if (dot >= 0) return 10 ** -(printed.length - dot - 1);
  const integerDigits = printed.replace(/^[−-]/, '').length;
  return 10 ** Math.max(0, integerDigits - digits);
}

/**
 * A printed positive size moved down one place where rounding to the nearest put it above the
 * size it stands for: a tolerance printed wider than the band it states would accept what the
 * record refuses (20 N = 4.496 lbf prints 4.49, not 4.50). The printed number keeps its places.
 */
export function notAbove(printed: string, exact: number, digits: number): string {
  const n = numberOf(printed);
  if (!(n > exact * (1 + 1e-9))) return printed;
  const dot = printed.indexOf('.');
  const decimals = dot < 0 ? 0 : printed.length - dot - 1;
  return (n - lastPlace(printed, digits)).toFixed(decimals);
}
