import { inflateSync } from 'node:zlib';

/**
 * Unpacks a WOFF 1.0 file into the plain TrueType/OpenType (sfnt) bytes it wraps
 * (W3C WOFF 1.0, §4–5). fontkit reads WOFF by re-inflating a table on every access, with a
 * pure-JS inflater, which made one sheet take seconds; inflating once here with zlib makes
 * the fonts as fast as TTF files.
 */
export function woffToSfnt(woff: Buffer, dropTables: readonly string[] = []): Buffer {
  if (woff.toString('latin1', 0, 4) !== 'wOFF') throw new Error('not a WOFF 1.0 file');
  const flavor = woff.readUInt32BE(4);
  const count = woff.readUInt16BE(12);
  const tables: { tag: string; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < count; i++) {
    const at = 44 + i * 20;
    const tag = woff.toString('latin1', at, at + 4);
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const checksum = woff.readUInt32BE(at + 16);
    if (dropTables.includes(tag)) continue;
    const raw = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : Buffer.from(raw);
    if (data.length !== origLength) throw new Error(`WOFF table ${tag}: bad length`);
    tables.push({ tag, checksum, data });
  }
  const numTables = tables.length;
  // The sfnt directory must be sorted by tag.
  tables.sort((a, b) => (a.tag < b.tag ? -1 : a.tag > b.tag ? 1 : 0));
  const pow = 2 ** Math.floor(Math.log2(numTables));
  const headerSize = 12 + 16 * numTables;
  const pad = (n: number) => (n + 3) & ~3;
  const total = tables.reduce((sum, t) => sum + pad(t.data.length), headerSize);
  const out = Buffer.alloc(total);
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(pow * 16, 6);
  out.writeUInt16BE(Math.log2(pow), 8);
  out.writeUInt16BE(numTables * 16 - pow * 16, 10);
  let offset = headerSize;
  tables.forEach((t, i) => {
    const at = 12 + i * 16;
    out.write(t.tag, at, 'latin1');
    out.writeUInt32BE(t.checksum, at + 4);
    out.writeUInt32BE(offset, at + 8);
    out.writeUInt32BE(t.data.length, at + 12);
    t.data.copy(out, offset);
    offset += pad(t.data.length);
  });
  return out;
}
