/**
 * Gives an sfnt font a new PostScript name (name table, nameID 6).
 *
 * The fontsource subsets of one face (latin, latin-ext, greek) share a PostScript name. pdfkit
 * keys embedded fonts by that name, so with several subsets in one document it re-embedded a
 * subset for every text run that switched font: dozens of duplicate fonts and about a second
 * of extra work per sheet. A unique name per subset lets pdfkit reuse each embedded font.
 */
export function renamePostScript(sfnt: Buffer, name: string): Buffer {
  const numTables = sfnt.readUInt16BE(4);
  let dirAt = -1;
  for (let i = 0; i < numTables; i++) {
    if (sfnt.toString('latin1', 12 + i * 16, 16 + i * 16) === 'name') dirAt = 12 + i * 16;
  }
  if (dirAt < 0) return sfnt;
  const tableAt = sfnt.readUInt32BE(dirAt + 8);
  const table = sfnt.subarray(tableAt, tableAt + sfnt.readUInt32BE(dirAt + 12));
  const count = table.readUInt16BE(2);
  const storageAt = table.readUInt16BE(4);
  const strings: Buffer[] = [];
  const records: number[][] = [];
  for (let i = 0; i < count; i++) {
    const at = 6 + i * 12;
    const [platform, encoding, language, nameId, length, offset] = [0, 2, 4, 6, 8, 10].map((k) =>
      table.readUInt16BE(at + k),
    );
    let bytes = table.subarray(storageAt + offset, storageAt + offset + length);
    if (nameId === 6) bytes = platform === 1 ? Buffer.from(name, 'latin1') : utf16be(name);
    records.push([platform, encoding, language, nameId, bytes.length]);
    strings.push(Buffer.from(bytes));
  }
  const header = Buffer.alloc(6 + count * 12);
  header.writeUInt16BE(0, 0);
  header.writeUInt16BE(count, 2);
  header.writeUInt16BE(header.length, 4);
  let offset = 0;
  records.forEach((r, i) => {
    r.forEach((v, k) => header.writeUInt16BE(v, 6 + i * 12 + k * 2));
    header.writeUInt16BE(offset, 6 + i * 12 + 10);
    offset += r[4];
  });
  const newTable = Buffer.concat([header, ...strings]);
  return replaceTable(sfnt, dirAt, newTable);
}

function utf16be(text: string): Buffer {
  const b = Buffer.from(text, 'utf16le');
  return b.swap16();
}

/** Rebuilds the font with one table's bytes replaced (appended at the end, 4-byte aligned). */
function replaceTable(sfnt: Buffer, dirAt: number, data: Buffer): Buffer {
  const end = (sfnt.length + 3) & ~3;
  const out = Buffer.alloc(end + ((data.length + 3) & ~3));
  sfnt.copy(out);
  data.copy(out, end);
  out.writeUInt32BE(end, dirAt + 8);
  out.writeUInt32BE(data.length, dirAt + 12);
  return out;
}
