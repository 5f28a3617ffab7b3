import { beforeAll, describe, expect, it } from 'vitest';
import { renderFieldCardPdf, renderSheetPdf } from './render.js';
import { isMinorCheck, sourceMark } from './parts/summary.js';
import { collectReferences } from './parts/references.js';
import { criteriaFor, realPrintable } from './testing/real-sheet.js';
import { ensurePoppler, inspectPdf, type PdfFacts } from './testing/poppler.js';
import {
  acceptedRange,
  bandedTolerance,
  getSheetType,
  settingTableTitle,
  settingTolerance,
  toDisplay,
  toleranceBeyondBand,
  toleranceText,
  type Dimension,
} from '@holdfast/calc';

// The same renderers over real calc evaluations of every sheet type's default inputs.
const SLOW = 300_000;
const TYPES = ['hoist-shoe-brake', 'travel-shoe-brake', 'caliper-disc-brake', 'disc-spring-stack'];

describe.each(TYPES)('%s, real evaluation', (sheetTypeId) => {
  const sheet = realPrintable({ sheetTypeId, state: 'approved' });
  let pdf: PdfFacts;
  let card: PdfFacts;

  beforeAll(async () => {
    ensurePoppler();
    pdf = inspectPdf(await renderSheetPdf(sheet), `real-${sheetTypeId}`);
    card = inspectPdf(await renderFieldCardPdf(sheet), `real-${sheetTypeId}-card`);
  }, SLOW);

  it('numbers every page and prints the verification code on each', () => {
    pdf.pageText.forEach((t, i) => {
      expect(t).toContain(`Page ${i + 1} of ${pdf.pages}`);
      expect(t).toContain('K3M9QZ7TXA');
    });
  });

  it('gives every governing check a verdict on page 1, the minor ones after the derivation', () => {
    const all = sheet.evaluation!.checks;
    const checks = all.filter((c) => !isMinorCheck(c));
    const minor = all.filter(isMinorCheck);
    const first = pdf.pageText[0] + (pdf.pageText[1] ?? '');
    for (const c of minor.filter((x) => x.label.length <= 40)) {
      expect(first, c.label).not.toContain(c.label);
    }
    if (minor.length > 0) {
      const rest = pdf.pageText.slice(2).join('\n');
      expect(rest).toContain('Minor checks');
      for (const c of minor.filter((x) => x.label.length <= 40)) {
        const row = rest.split('\n').find((l) => l.includes(c.label));
        expect(row, c.label).toMatch(/\bPASS\b/);
      }
    }
    const count = (re: RegExp) => (first.match(re) ?? []).length;
    expect(count(/\bPASS\b/g)).toBe(checks.filter((c) => c.pass).length);
    expect(count(/\bFAIL\b/g)).toBe(checks.filter((c) => !c.pass).length);
    const lines = first.split('\n');
    for (const c of checks.filter((x) => x.label.length <= 40)) {
      const row = lines.find((l) => l.includes(c.label));
      expect(row, c.label).toMatch(c.pass ? /\bPASS\b/ : /\bFAIL\b/);
    }
  });

  it('prints every derivation step and every field setting', () => {
    const text = pdf.text.replace(/\s+/g, ' ');
    for (const step of sheet.evaluation!.derivation) {
      // Long formulas wrap beside the reference column: compare their start.
      expect(text, step.id).toContain(step.formula.replace(/\s+/g, ' ').slice(0, 40));
    }
    for (const f of sheet.evaluation!.fieldSettings) {
      expect(text, f.key).toContain(f.label.replace(/\s+/g, ' ').slice(0, 30));
    }
  });

  it('lists only the criteria values its checks read (a stack sheet reads none and says so)', () => {
    const text = pdf.text.replace(/\s+/g, ' ');
    const used = sheet.evaluation!.criteriaUsed!;
    const values = criteriaFor(sheetTypeId).values;
    // Table cells wrap, so a label is found by its start; two labels may start alike.
    const start = (label: string) => label.slice(0, 40);
    const usedStarts = values.filter((v) => used.includes(v.key)).map((v) => start(v.label));
    for (const s of usedStarts) expect(text).toContain(s);
    for (const v of values.filter((x) => !usedStarts.includes(start(x.label)))) {
      expect(text, v.key).not.toContain(start(v.label));
    }
    if (sheetTypeId === 'disc-spring-stack') {
      expect(used).toEqual([]);
      expect(text).toContain('No check of this sheet reads a value of the criteria set');
    } else expect(text).toContain('Criteria values this sheet uses, and their sources');
  });

  it('never splits a word where its font changes (no hyphen a reader could take for a minus)', () => {
    const text = pdf.text.replace(/\s+/g, ' ');
    expect(text).not.toMatch(/\/- /);
    // The caliper's reference-torque choice sits right-aligned in a narrow column.
    if (sheetTypeId === 'caliper-disc-brake') expect(text).toContain('the load (M_L/η)');
  });

  it('fits the field card on one or two pages', () => {
    expect(card.pages).toBeLessThanOrEqual(2);
    expect(card.text).toContain('Set by');
  });

  it(
    'fits the field card on one or two US Letter pages too (a shorter page than A4)',
    async () => {
      const letter = realPrintable({ sheetTypeId, state: 'approved', paper: 'LETTER' });
      const facts = inspectPdf(await renderFieldCardPdf(letter), `real-${sheetTypeId}-card-letter`);
      expect(facts.pages).toBeLessThanOrEqual(2);
    },
    SLOW,
  );

  it('holds card tolerances inside the band: the sheet says so, the card prints the held one', () => {
    const ev = sheet.evaluation!;
    const layout = getSheetType(sheetTypeId)!.fieldCard;
    const lines = ev.tables.flatMap((t) => toleranceBeyondBand(ev, t, layout, sheet.unitSystem));
    // The demo hoist's ±5 % on the spring force reaches past its narrow band.
    if (sheetTypeId === 'hoist-shoe-brake') expect(lines).toHaveLength(1);
    const flat = (t: string) => t.replace(/\s+/g, ' ');
    for (const line of lines) expect(flat(pdf.text)).toContain(flat(`Tolerance narrowed: ${line}`));
    for (const f of ev.fieldSettings) {
      const held = bandedTolerance(f, layout, ev);
      if (held && held !== settingTolerance(f, layout))
        expect(flat(card.text)).toContain(toleranceText(held, f.dimension, sheet.unitSystem));
    }
  });

  it('prints the values each two-sided tolerance accepts, as the record form gives them', () => {
    const ev = sheet.evaluation!;
    const layout = getSheetType(sheetTypeId)!.fieldCard;
    const flat = card.text.replace(/\s+/g, ' ');
    let ranges = 0;
    // A stack's preload follows from its back-off: the card gives it as "about", with no range.
    for (const f of ev.fieldSettings.filter((x) => !/preload$/i.test(x.key))) {
      const held = bandedTolerance(f, layout, ev);
      const range = acceptedRange(f.value, held, f.key, f.dimension, sheet.unitSystem);
      if (!range) continue;
      ranges += 1;
      // In a settings table the range comes first; beside a stack's back-off, after the tolerance.
      expect([`${range.text} (`, `(${range.text})`].some((t) => flat.includes(t))).toBe(true);
    }
    expect(ranges).toBeGreaterThan(0);
    // Demo hoist: 221.25 mm ± 0.5 mm, so not "221.0 to 222.0" around the printed 221.5 mm.
    if (sheetTypeId === 'hoist-shoe-brake') expect(flat).toContain('220.8 to 221.7 mm (± 0.5 mm)');
  });

  it("gives each summary check its source's number under References", () => {
    const refs = collectReferences(sheet);
    const flat = pdf.text.replace(/\s+/g, ' ');
    const shown = sheet.evaluation!.checks.filter((c) => !isMinorCheck(c));
    expect(shown.length).toBeGreaterThan(0);
    for (const c of shown) {
      const n = refs.indexOf(c.source.trim()) + 1;
      expect(n, c.id).toBeGreaterThan(0);
      expect(flat).toContain(`[${n}] ${refs[n - 1]}`);
    }
    // Each row's label ends with that number.
    for (const c of shown)
      expect(sourceMark(c, sheet)).toBe(` [${refs.indexOf(c.source.trim()) + 1}]`);
  });

  it('marks an input the sheet holds but does not use (the clearance with no lift stop)', () => {
    const flat = pdf.text.replace(/\s+/g, ' ');
    if (sheetTypeId === 'hoist-shoe-brake' || sheetTypeId === 'travel-shoe-brake') {
      // The cell wraps: its second line comes after the row's other cells in the text.
      expect(flat).toContain('Shoe clearance when released (per shoe) — not used');
      expect(flat).toContain('(Thruster has a lift stop: No)');
    }
    // An input the sheet uses is never marked.
    expect(flat).not.toMatch(/Rated load[^—]*— not used/);
  });

  it('keeps each setting table of the card on one page, its title with its last row', () => {
    const ev = sheet.evaluation!;
    for (const t of ev.tables) {
      const title = settingTableTitle(t.title, sheet.unitSystem).slice(0, 30);
      const page = card.pageText.findIndex((p) => p.replace(/\s+/g, ' ').includes(title));
      expect(page, t.id).toBeGreaterThanOrEqual(0);
      // The table's last setting, as its first column prints it, is on the title's page.
      const last = t.rows[t.rows.length - 1]!;
      const key = t.columns[0]!.key;
      const shown = toDisplay(
        last[key]!,
        t.columns[0]!.dimension as Dimension,
        sheet.unitSystem,
      ).number;
      expect(card.pageText[page], `${t.id} last row ${shown}`).toContain(shown);
    }
  });

  it("speaks of the brake's own parts on the card: pads and a disc, or lining and a drum", () => {
    const text = card.text.replace(/\s+/g, ' ');
    if (sheetTypeId === 'caliper-disc-brake') {
      expect(text).toContain('Pad wear widens the air gap');
      expect(text).not.toMatch(/lining|shoe|drum(?! brake)/i);
    } else if (sheetTypeId !== 'disc-spring-stack') {
      expect(text).toContain('Lining wear uses up the reserve');
    }
  });
});

describe('hoist field card, real evaluation', () => {
  it(
    "prints each stack's back-off tolerance as the sheet declares it, one-sided",
    async () => {
      ensurePoppler();
      const sheet = realPrintable({ sheetTypeId: 'hoist-shoe-brake', state: 'approved' });
      const card = inspectPdf(await renderFieldCardPdf(sheet), 'real-hoist-card-tolerance');
      const text = card.text.replace(/\s+/g, ' ');
      // Demo: holder 60° with 15° declared, equaliser 240° with 30° declared.
      expect(text).toMatch(/Shoe holder.*?Tolerance −0 ?° \/ \+15 ?°/);
      expect(text).toMatch(/Equaliser.*?Tolerance −0 ?° \/ \+30 ?°/);
    },
    SLOW,
  );
});
