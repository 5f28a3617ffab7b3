/**
 * Canonical JSON: object keys sorted by UTF-16 code unit, no whitespace, numbers as ECMAScript
 * prints them (shortest round-trip form), `undefined` object members dropped. Two equal values
 * always give the same text, so a hash over it identifies the content, not its layout.
 * Throws on values JSON cannot carry faithfully (NaN, Infinity, bigint, functions, cycles).
 */
export function canonicalJson(value: unknown): string {
  return write(value, new Set());
}

function write(value: unknown, seen: Set<object>): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'boolean':
      return value ? 'true' : 'false';
    case 'string':
      return JSON.stringify(value);
    case 'number':
      if (!Number.isFinite(value)) throw new TypeError(`canonicalJson: ${value} is not JSON`);
      return JSON.stringify(Object.is(value, -0) ? 0 : value);
    case 'object':
      break;
    default:
      throw new TypeError(`canonicalJson: a ${typeof value} is not JSON`);
  }
  const obj = value as object;
  if (seen.has(obj)) throw new TypeError('canonicalJson: cyclic value');
  seen.add(obj);
  let out: string;
  if (Array.isArray(obj)) {
    out = `[${obj.map((v) => (v === undefined ? 'null' : write(v, seen))).join(',')}]`;
  } else if (obj instanceof Date) {
    out = JSON.stringify(obj.toISOString());
  } else {
    const entries = Object.entries(obj)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    out = `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${write(v, seen)}`).join(',')}}`;
  }
  seen.delete(obj);
  return out;
}
