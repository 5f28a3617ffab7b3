import { beforeAll, describe, expect, it } from 'vitest';
import { renderFieldCardPdf, renderSheetPdf } from './render.js';
import { hoistPrintable } from './testing/hoist-fixture.js';
import { ensurePoppler, inspectPdf, pageInk, type PdfFacts } from './testing/poppler.js';
import type { PrintableSheet } from './printable-sheet.js';

// Rendering is CPU-bound and the first call parses fonts: render once per state, assert many times.
const SLOW = 180_000;
const squash = (t: string) => t.replace(/\s+/g, ' ');

function expectEveryPageNumbered(pdf: PdfFacts) {
  expect(pdf.pages).toBeGreaterThan(1);
  pdf.pageText.forEach((text, i) => {
    expect(text).toContain(`Page ${i + 1} of ${pdf.pages}`);
  });
}

function expectTitleBlockOnEveryPage(pdf: PdfFacts, sheet: PrintableSheet, state: string) {
  for (const text of pdf.pageText) {
    const t = squash(text);
    expect(t).toContain('HOLDFAST');
    expect(t).toContain(sheet.documentNumber);
    expect(t).toContain(sheet.title);
    expect(t).toContain(sheet.site.name);
    expect(t).toContain(`${sheet.equipment.tag} ${sheet.equipment.name}`);
    expect(t).toContain(sheet.position.tag);
    expect(t).toMatch(new RegExp(`REVISION\\s+${sheet.revision.label}\\b`));
    expect(t).toMatch(new RegExp(`STATE\\s+${state}`));
  }
}

/**
 * Each check's row (found by its label) says PASS or FAIL as the evaluation does. Read in
 * content order, where the verdict is the first PASS/FAIL after the label (layout mode can
 * interleave the diagonal marking with table rows).
 */
function expectVerdicts(pdf: PdfFacts, sheet: PrintableSheet) {
  const raw = squash(pdf.rawPageText[0]);
  for (const c of sheet.evaluation!.checks) {
    const at = raw.indexOf(c.label);
    expect(at, c.label).toBeGreaterThanOrEqual(0);
    const verdict = /\b(PASS|FAIL)\b/.exec(raw.slice(at + c.label.length))?.[1];
    expect(verdict, c.label).toBe(c.pass ? 'PASS' : 'FAIL');
  }
}

describe('calculation sheet PDF', () => {
  const sheets = {
    approved: hoistPrintable({ state: 'approved', criteriaUsed: ['torqueFactor'] }),
    draft: hoistPrintable({ state: 'draft', failing: true }),
    inCheck: hoistPrintable({ state: 'in_check' }),
    superseded: hoistPrintable({ state: 'superseded', paper: 'LETTER', unitSystem: 'US' }),
  };
  const pdf = {} as Record<keyof typeof sheets, PdfFacts>;

  beforeAll(async () => {
    ensurePoppler();
    for (const [k, sheet] of Object.entries(sheets)) {
      pdf[k as keyof typeof sheets] = inspectPdf(await renderSheetPdf(sheet), `sheet-${k}`);
    }
  }, SLOW);

  it('approved: title block, page n of N and the verification code on every page, A4', () => {
    const p = pdf.approved;
    expectTitleBlockOnEveryPage(p, sheets.approved, 'Approved');
    expectEveryPageNumbered(p);
    for (const t of p.pageText) expect(t).toContain('HF7K-2QX9');
    expect(p.size.width).toBeCloseTo(595.28, 0);
    expect(p.size.height).toBeCloseTo(841.89, 0);
    expect(p.text).not.toContain('NOT FOR USE');
    expect(p.text).not.toContain('SUPERSEDED');
  });

  it('approved: every check with its verdict, the approvals and the caution on page 1', () => {
    const p = pdf.approved;
    expectVerdicts(p, sheets.approved);
    const first = squash(p.pageText[0]);
    expect(first).toMatch(/Prepared\s+Ada Demo\s+AD\s+2026-11-03/);
    expect(first).toMatch(/Checked and approved\s+Ben Checker\s+BC\s+2026-11-04/);
    expect(first).toContain('never replace, the judgement of a competent engineer');
    expect(first).toContain("the brake maker's data, local codes and licensed practice decide");
    expect(first).toContain('land the load or lock the drum');
    expect(first).toContain('Isolate and lock out the drive');
    // History lists A and B, not the later draft C.
    expect(first).toMatch(/\bA\s+2026-03-05\s+Superseded\s+First issue\./);
    expect(first).not.toContain('Later draft');
  });

  it('approved: design basis, inputs in both forms, derivation, charts, settings, references', () => {
    const t = squash(pdf.approved.text);
    expect(t).toContain('Demo hoist criteria (demo-hoist), version 3');
    // Only the criteria values the evaluation read; a set's other values do not bear on it.
    expect(t).toContain('Criteria values this sheet uses, and their sources');
    expect(t).toContain('Torque factor k');
    expect(t).not.toContain('Lining pressure limit');
    expect(t).toContain('Torque reference: Motor rated torque');
    expect(t).toContain('Holdfast calculation core 0.3.0-fixture');
    expect(t).toMatch(/Lining width b 7\.48 in 190\.0 mm/);
    expect(t).toContain('T_req = k · T_m');
    expect(t).toContain('T_req = 2.000 · 872.5 N·m');
    expect(t).toContain('Brake torque against lining wear');
    expect(t).toContain('Set point');
    expect(t).toContain('Spring setting table');
    // Field settings print to what a fitter measures (feeler step 0.05 mm), as the card does.
    expect(t).toMatch(/Shoe clearance each side 0\.80 mm/);
    expect(t).toMatch(/\[\d+\] Textbook of machine elements, 3rd ed\., §12\.4/);
  });

  it('approved: the cautions on page 1 defer to the standard, the maker and licensed practice', () => {
    const t = squash(pdf.approved.pageText[0]);
    expect(t).toContain('Never work under a suspended load');
    expect(t).toContain('Adjust one brake at a time');
    expect(t).toContain('separately, the thruster supply');
    expect(t).toContain("the brake maker's data, local codes and licensed practice decide");
    expect(t).not.toContain('drum or disc');
  });

  it('prints math and Greek symbols as themselves (fallback fonts), not as other letters', () => {
    const t = squash(pdf.approved.text);
    expect(t).toContain('Shoe force check 1 (η ≤ 1, √ of Δθ · σ)');
    expect(t).toContain('N = F_s · i_L · η_L => N ≥ 0');
    expect(t).toContain('μ_min');
    expect(t).toContain('½');
  });

  it('embeds Inter and JetBrains Mono (and the symbol fallback), each subset once', () => {
    const names = pdf.approved.fonts.map((f) => f.name.replace(/^[A-Z]{6}\+/, ''));
    expect(names.some((n) => n.startsWith('Inter-'))).toBe(true);
    expect(names.some((n) => n.startsWith('JetBrainsMono-'))).toBe(true);
    expect(names.some((n) => n.startsWith('DejaVuSans'))).toBe(true);
    expect(pdf.approved.fonts.every((f) => f.embedded)).toBe(true);
    // One embedded subset per face: duplicates mean pdfkit's font cache was defeated again.
    expect(new Set(names).size).toBe(names.length);
  });

  it('draft: NOT FOR USE — DRAFT on every page, no approvals, justification for the failure', () => {
    const p = pdf.draft;
    expectTitleBlockOnEveryPage(p, sheets.draft, 'Draft');
    expectEveryPageNumbered(p);
    for (const t of p.pageText) expect(t).toContain('NOT FOR USE — DRAFT');
    expectVerdicts(p, sheets.draft);
    const t = squash(p.text);
    expect(t).not.toContain('Checked and approved');
    expect(t).toContain('Not approved: this revision is draft');
    expect(t).toMatch(/No code: not an approved .*revision/);
    expect(t).toContain('Justification for failed checks');
    expect(t).toContain('lining maker confirmed by letter');
  });

  it('in check: NOT FOR USE — IN CHECK on every page and no approvals', () => {
    const p = pdf.inCheck;
    expectTitleBlockOnEveryPage(p, sheets.inCheck, 'In check');
    for (const t of p.pageText) expect(t).toContain('NOT FOR USE — IN CHECK');
    expect(p.text).not.toContain('Checked and approved');
    expect(squash(p.text)).toContain('Prepared by Ada Demo (AD), submitted 2026-11-03');
  });

  it('superseded, US Letter, US units: SUPERSEDED by rev C on its date on every page', () => {
    const p = pdf.superseded;
    expect(p.size).toEqual({ width: 612, height: 792 });
    expectTitleBlockOnEveryPage(p, sheets.superseded, 'Superseded');
    expectEveryPageNumbered(p);
    for (const t of p.pageText) expect(t).toContain('SUPERSEDED by rev C on 2026-11-20');
    expect(squash(p.text)).toMatch(/Checked and approved\s+Ben Checker\s+BC/);
    expect(p.text).toContain('lbf·ft');
    expect(p.text).not.toContain('NOT FOR USE');
    // Evaluated before the core kept which criteria it read: the whole set, said so.
    expect(squash(p.text)).toContain('Criteria values and their sources (the whole set)');
    expect(squash(p.text)).toContain('Lining pressure limit');
  });

  it('renders pages with ink on them (PNG under test-output/pdf for a look)', () => {
    for (const k of ['approved', 'draft'] as const) {
      const ink = pageInk(pdf[k].file, `sheet-${k}`);
      expect(ink).toHaveLength(pdf[k].pages);
      // A white page has a spread of 0; text pages measure well above 10 grey levels.
      for (const v of ink) expect(v).toBeGreaterThan(10);
    }
  });
});

describe('field setting card PDF', () => {
  const sheet = hoistPrintable({ state: 'approved' });
  let card: PdfFacts;

  beforeAll(async () => {
    ensurePoppler();
    card = inspectPdf(await renderFieldCardPdf(sheet), 'field-card-approved');
  }, SLOW);

  it('fits on one or two pages with the title block and verification code on each', () => {
    expect(card.pages).toBeGreaterThanOrEqual(1);
    expect(card.pages).toBeLessThanOrEqual(2);
    card.pageText.forEach((t, i) => {
      expect(t).toContain(`Page ${i + 1} of ${card.pages}`);
      expect(t).toContain('HF7K-2QX9');
      expect(t).toContain('Field setting card');
    });
  });

  it('gives spring, thruster, clearance and disc-spring settings with room to record', () => {
    const t = squash(card.text);
    expect(t).toMatch(/Main spring set length .*231\.5 mm/);
    expect(t).toContain('Spring setting table');
    expect(t).toMatch(/Minimum reserve stroke to keep 10\.0 mm/);
    expect(t).toMatch(/Shoe clearance each side 0\.80 mm/);
    expect(t).toContain('Disc-spring stacks Shoe holder 1. Tighten the nut');
    expect(t).toContain('Tighten the nut until the disc-spring stack is just flat');
    expect(t).toMatch(/Back off the nut by 60° and lock it/);
    expect(t).toMatch(/Back off the nut by 180° and lock it/);
    expect(t).toMatch(/preload of about 3100 N/);
    expect(t).toContain('no shoe drags');
    expect(t).toContain('Set and release the brake at least five times');
    expect(t).toMatch(/Set by .*Checked by/);
    expect(t).toContain('Isolate and lock out the drive');
  });

  it('prints the cautions for brake work and the reworded lines', () => {
    const t = squash(card.text);
    expect(t).toContain('Never work under a suspended load');
    expect(t).toContain(
      'land the load or lock the drum before brake work; nothing on the hook (no ladle, no load)',
    );
    expect(t).toContain('Adjust one brake at a time');
    expect(t).toContain('separately, the thruster supply');
    expect(t).toContain(
      'Keep hands clear of the arms and levers while the thruster can be energised',
    );
    expect(t).toContain('The drum and the thruster oil can be hot');
    expect(t).toContain('The thruster push rod is not a lifting point');
    expect(t).toContain('open the brake with the hand release');
    expect(t).toContain('surface thermometer');
    expect(t).toContain('brake can lose all holding torque');
    expect(t).toContain('local codes and licensed practice decide');
    // The hoist fixture's rated load is 95 t: the static test load is named, 1.25 × that.
    expect(t).toMatch(/holds the test load of 118800 kg \(1\.25 × rated load/);
    expect(t).not.toMatch(/feel the drum|drum or disc|push rod\.|brake loses torque/);
  });

  it('has ink on every page', () => {
    for (const v of pageInk(card.file, 'field-card-approved')) expect(v).toBeGreaterThan(10);
  });
});
