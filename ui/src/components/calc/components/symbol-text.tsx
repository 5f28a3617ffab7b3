import { Fragment } from 'react';

/**
 * Prints a derivation symbol such as 'F_s' or 'M_b,min' with its subscript, so 'F_s' reads F
 * with a lowered s. Anything after the first underscore is the subscript.
 */
export function SymbolText({ symbol }: { symbol: string }) {
  const i = symbol.indexOf('_');
  if (i <= 0) return <Fragment>{symbol}</Fragment>;
  const base = symbol.slice(0, i);
  const sub = symbol.slice(i + 1).replace(/^\{(.*)\}$/, '$1');
  return (
    <Fragment>
      {base}
      <sub>{sub}</sub>
    </Fragment>
  );
}
