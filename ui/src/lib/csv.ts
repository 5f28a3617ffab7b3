/**
 * One CSV field (RFC 4180): quoted when it holds a comma, quote, semicolon or line break, with
 * quotes doubled. A field that a spreadsheet would run as a formula (=, +, -, @ first) gets a
 * leading apostrophe, so an exported title can never execute.
 */
export function csvField(value: string | number | null | undefined): string {
  let s = value === null || value === undefined ? '' : String(value);
  if (/^[=+\-@\t\r]/.test(s) && !/^-?\d/.test(s)) s = `'${s}`;
  return /[",;\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Rows to CSV text with CRLF line ends and a UTF-8 byte-order mark for spreadsheet programs. */
export function toCsv(rows: (string | number | null | undefined)[][]): string {
  return `\uFEFF${rows.map((r) => r.map(csvField).join(',')).join('\r\n')}\r\n`;
}

/** A CSV text as a Blob ready for saveBlob. */
export function csvBlob(text: string): Blob {
  return new Blob([text], { type: 'text/csv;charset=utf-8' });
}
