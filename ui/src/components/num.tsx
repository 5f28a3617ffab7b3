import type { ComponentPropsWithoutRef } from 'react';
import classes from './num.module.css';

export interface FormatNumberOptions {
  /** Fixed decimals; by default up to 4 significant decimals with trailing zeros dropped. */
  digits?: number;
  /** Show a + on positive values (differences, changes). */
  signed?: boolean;
}

const cache = new Map<string, Intl.NumberFormat>();
function formatter(digits: number | undefined, signed: boolean): Intl.NumberFormat {
  const key = `${digits ?? 'auto'}|${signed}`;
  let f = cache.get(key);
  if (!f) {
    f = new Intl.NumberFormat('en-GB', {
      minimumFractionDigits: digits ?? 0,
      maximumFractionDigits: digits ?? 4,
      signDisplay: signed ? 'exceptZero' : 'auto',
      useGrouping: true,
    });
    cache.set(key, f);
  }
  return f;
}

/** Format a number the way Holdfast prints numbers: en-GB grouping, a real minus sign. */
export function formatNumber(value: number, options: FormatNumberOptions = {}): string {
  if (!Number.isFinite(value)) return Number.isNaN(value) ? '—' : value > 0 ? '∞' : '−∞';
  return formatter(options.digits, options.signed ?? false)
    .format(value)
    .replace('-', '−');
}

export interface NumProps extends FormatNumberOptions, ComponentPropsWithoutRef<'span'> {
  value: number | null | undefined;
  /** Unit symbol printed after a thin space, e.g. "N·m". */
  unit?: string;
}

/** A number in JetBrains Mono with tabular figures, optionally with its unit. */
export function Num({ value, unit, digits, signed, className, ...rest }: NumProps) {
  const text =
    value === null || value === undefined ? '—' : formatNumber(value, { digits, signed });
  return (
    <span className={className ? `${classes.num} ${className}` : classes.num} {...rest}>
      {text}
      {unit ? <span className={classes.unit}>{`\u2009${unit}`}</span> : null}
    </span>
  );
}
