import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { sheetTypes } from '../sheets/registry.js';

const DOC = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  '../../../docs/calc-reference.md',
);

describe('docs/calc-reference.md', () => {
  it('lists every input field of every sheet type (regenerate with npm run docs:reference -w @holdfast/calc)', () => {
    const text = readFileSync(DOC, 'utf8');
    const missing = sheetTypes.flatMap((s) =>
      s.fields.map((f) => f.key).filter((k) => !text.includes(`\`${k}\``)),
    );
    expect(missing).toEqual([]);
  });
});
