import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { CRITERIA_SETS } from '../criteria/sets.js';
import { DIMENSION_IDS, SHEET_TYPE_IDS } from '../ids.js';
import { demoInputs, sheetTypes } from './registry.js';

// The sheet definitions in calc/src/sheets are the one place where fields, their demo values and
// the field card's groups are declared. This test reads the other workspaces' sources (tests and
// test fixtures aside, which may spell out inputs on purpose) and fails where one is declared again.
const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
const ROOTS = ['shared/src', 'print/src', 'server/src', 'ui/src', 'db/src', 'db/seeds'];
const isFixture = (p: string) => /\.test\.tsx?$|\/testing[/-]|\/e2e\/|\.bench\.ts$/.test(p);

function sources(): { file: string; text: string }[] {
  const walk = (dir: string): string[] =>
    readdirSync(dir).flatMap((n) => {
      const p = path.join(dir, n);
      return statSync(p).isDirectory() ? walk(p) : [p];
    });
  return ROOTS.flatMap((r) => walk(path.join(repo, r)))
    .filter((p) => /\.(ts|tsx|mjs)$/.test(p) && !isFixture(p))
    .map((file) => ({ file: path.relative(repo, file), text: readFileSync(file, 'utf8') }));
}

const fieldKeys = [...new Set(sheetTypes.flatMap((s) => s.fields.map((f) => f.key)))];

describe('sheet definitions are the single source', () => {
  const files = sources();

  it('reads the sources it guards', () => {
    expect(files.some((f) => f.file === 'server/src/calc/calc-engine.ts')).toBe(true);
    expect(files.some((f) => f.file === 'print/src/field-card-groups.ts')).toBe(true);
    expect(fieldKeys.length).toBeGreaterThan(100);
  });

  it('no field key is given a literal value outside calc (no second copy of a default)', () => {
    const hits: string[] = [];
    for (const { file, text } of files) {
      for (const key of fieldKeys) {
        const literal = new RegExp(
          `(?<![\\w.$])${key}\\s*:\\s*(\\{\\s*value\\b|-?\\d|'|"|true\\b|false\\b)`,
        );
        if (literal.test(text)) hits.push(`${file}: ${key}`);
      }
    }
    expect(hits).toEqual([]);
  });

  it('no field is declared outside calc, and nothing reads a field default', () => {
    const hits = files
      .filter(({ text }) =>
        // A declaration is an object with a field kind and a dimension, unit or section.
        /kind:\s*'(quantity|number|integer|choice|boolean)'[^}]*\b(dimension|unitSI|section)\s*:/.test(
          text,
        ),
      )
      .map((f) => `${f.file}: field declaration`)
      .concat(
        files
          .filter(({ text }) => /\b(f|field|def)\.default\b/.test(text))
          .map((f) => `${f.file}: reads a field default`),
      );
    expect(hits).toEqual([]);
  });

  it('the field card groups by declared placement, never by label text', () => {
    const card = files.find((f) => f.file === 'print/src/field-card-groups.ts')!.text;
    expect(card).toMatch(/fieldCard/);
    expect(card).not.toMatch(/\/[^/\n]+\/[gimsuy]*\.test\(/);
  });

  it.each(sheetTypes.map((s) => [s.id, s] as const))(
    '%s: every field setting and table of the demo has a declared place on the field card',
    (_id, sheet) => {
      for (const criteria of CRITERIA_SETS) {
        let e;
        try {
          e = sheet.evaluate(demoInputs(sheet), criteria);
        } catch {
          continue; // a criteria set for another duty may lack a value this sheet needs
        }
        for (const f of e.fieldSettings)
          expect(sheet.fieldCard.settings, f.key).toHaveProperty([f.key]);
        const tables = new Set(e.tables.map((t) => t.id));
        for (const t of sheet.fieldCard.springTables) expect(tables.has(t), t).toBe(true);
      }
    },
  );

  it('the ids module lists the registry and every field dimension', () => {
    expect(sheetTypes.map((s) => s.id)).toEqual([...SHEET_TYPE_IDS]);
    for (const f of sheetTypes.flatMap((s) => s.fields)) {
      if (f.dimension) expect(DIMENSION_IDS).toContain(f.dimension);
    }
  });

  it('every field declares its demo value and whether it is required', () => {
    for (const f of sheetTypes.flatMap((s) => s.fields)) {
      expect(f.demo, f.key).not.toBeUndefined();
      expect(typeof f.required, f.key).toBe('boolean');
      if (f.requiredIf) {
        const flag = sheetTypes.flatMap((s) => s.fields).find((x) => x.key === f.requiredIf);
        expect(flag?.kind, `${f.key} requiredIf`).toBe('boolean');
      }
    }
  });
});
