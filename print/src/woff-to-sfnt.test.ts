import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { renamePostScript } from './sfnt-rename.js';
import { woffToSfnt } from './woff-to-sfnt.js';

const require = createRequire(import.meta.url);
const woff = readFileSync(require.resolve('@fontsource/inter/files/inter-greek-400-normal.woff'));

function tags(sfnt: Buffer): string[] {
  const n = sfnt.readUInt16BE(4);
  return Array.from({ length: n }, (_, i) => sfnt.toString('latin1', 12 + i * 16, 16 + i * 16));
}

describe('woffToSfnt', () => {
  it('unpacks every table of the WOFF into a sorted sfnt directory', () => {
    const sfnt = woffToSfnt(woff);
    const woffTables = woff.readUInt16BE(12);
    expect(sfnt.readUInt32BE(0)).toBe(woff.readUInt32BE(4)); // flavour kept
    expect(tags(sfnt)).toHaveLength(woffTables);
    expect(tags(sfnt)).toEqual([...tags(sfnt)].sort());
    expect(tags(sfnt)).toContain('glyf');
    // totalSfntSize in the WOFF header is the size of the original font.
    expect(sfnt.length).toBe(woff.readUInt32BE(16));
  });

  it('drops the tables asked for', () => {
    expect(tags(woffToSfnt(woff, ['GSUB']))).not.toContain('GSUB');
    expect(tags(woffToSfnt(woff))).toContain('GSUB');
  });

  it('rejects a file that is not WOFF 1.0', () => {
    expect(() => woffToSfnt(Buffer.from('wOF2xxxxxxxxxxxx'))).toThrow(/not a WOFF/);
  });
});

describe('renamePostScript', () => {
  it('replaces the PostScript name (nameID 6) and keeps the other names', () => {
    const sfnt = woffToSfnt(woff);
    const renamed = renamePostScript(sfnt, 'InterGreek-Regular');
    const utf16 = (s: string) => Buffer.from(s, 'utf16le').swap16();
    expect(renamed.includes(utf16('InterGreek-Regular'))).toBe(true);
    expect(renamed.includes(utf16('Inter'))).toBe(true); // family name still there
    expect(tags(renamed)).toEqual(tags(sfnt));
  });
});
