import { describe, expect, it } from 'vitest';
import { csvField, toCsv } from './csv';

describe('csv', () => {
  it('quotes commas, quotes and line breaks, and doubles quotes', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField(null)).toBe('');
    expect(csvField(12.5)).toBe('12.5');
  });

  it('defuses spreadsheet formulas but keeps negative numbers', () => {
    expect(csvField('=HYPERLINK("x")')).toBe('"\'=HYPERLINK(""x"")"');
    expect(csvField('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvField('-3.5')).toBe('-3.5');
  });

  it('joins rows with CRLF after a byte-order mark', () => {
    expect(
      toCsv([
        ['a', 'b'],
        ['c,d', ''],
      ]),
    ).toBe('\uFEFFa,b\r\n"c,d",\r\n');
  });
});
