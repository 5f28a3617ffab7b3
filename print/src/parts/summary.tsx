import { checkFigures, isSafetyCaution, type CheckResult } from '@holdfast/calc';
import { Text } from '../text.js';
import { headingBlock, paragraphBlock, tableBlocks, type BlockContext } from '../blocks.js';
import type { FlowBlock } from '../flow.js';
import { pct } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours } from '../theme.js';
import { collectReferences } from './references.js';
import { Verdict, type Column } from './table.js';

/** Value and limit as printed (calc's checkFigures, the same the screen shows). */
function valueAndLimit(c: CheckResult, sheet: PrintableSheet): [string, string] {
  const f = checkFigures(c, sheet.unitSystem);
  return [f.value, f.limit];
}

/** 'Limit' column text: ≤ for maxima, ≥ for minima, in the sheet's units. */
export function limitText(c: CheckResult, sheet: PrintableSheet): string {
  return `${c.kind === 'max' ? '≤' : '≥'} ${valueAndLimit(c, sheet)[1]}`;
}

/** At or below this utilisation a passing check is noise on the summary page. */
export const MINOR_UTILISATION = 0.05;

/**
 * A passing check far from its limit: it moves from the summary to the minor checks after the
 * derivation, so the summary shows what governs. A zero limit has no meaningful utilisation
 * (stroke left ≥ 0 at 0 %), so such a check always stays on the summary.
 */
export function isMinorCheck(c: CheckResult): boolean {
  return c.pass && c.limit !== 0 && c.utilisation <= MINOR_UTILISATION;
}

/**
 * A check's source as its number in the references, e.g. ' [55]': a checker reads on page 1 what
 * each verdict rests on (a standard, a handbook table, common practice, the maker's data).
 */
export function sourceMark(c: CheckResult, sheet: PrintableSheet): string {
  const n = referenceNumbers(sheet).get(c.source.trim());
  return n === undefined ? '' : ` [${n}]`;
}

/** Each reference's number, worked out once per sheet (every summary row asks). */
const numbered = new WeakMap<PrintableSheet, Map<string, number>>();
function referenceNumbers(sheet: PrintableSheet): Map<string, number> {
  let m = numbered.get(sheet);
  if (!m) {
    m = new Map(collectReferences(sheet).map((r, i) => [r, i + 1]));
    numbered.set(sheet, m);
  }
  return m;
}

function checkRow(c: CheckResult, sheet: PrintableSheet, verdictHeight: number) {
  const [value] = valueAndLimit(c, sheet);
  return [
    c.label + sourceMark(c, sheet),
    value,
    limitText(c, sheet),
    pct(c.utilisation),
    { node: <Verdict key={c.id} pass={c.pass} />, height: verdictHeight },
  ];
}

/** The checks moved off the summary (utilisation ≤ 5 %), listed after the derivation. */
export function minorChecksBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const minor = sheet.evaluation?.checks.filter(isMinorCheck) ?? [];
  if (minor.length === 0) return [];
  const verdictHeight = ctx.m.lineHeight({ fontSize: 7.5, weight: 700 }) + 2;
  const intro = `Checks that pass at ${pct(MINOR_UTILISATION)} utilisation or less: far from their limits, they do not govern, and the summary leaves them out.`;
  return [
    headingBlock(ctx, 'minor-h', 'Minor checks'),
    { ...paragraphBlock(ctx, 'minor-intro', intro, { fontSize: 8.5 }), keepWithNext: true },
    ...tableBlocks(ctx, 'minor', {
      columns: SUMMARY_COLUMNS,
      continuedTitle: 'Minor checks',
      rows: minor.map((c) => checkRow(c, sheet, verdictHeight)),
    }),
  ];
}

export function purposeBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  return [headingBlock(ctx, 'purpose-h', 'Purpose'), paragraphBlock(ctx, 'purpose', sheet.purpose)];
}

const SUMMARY_COLUMNS: Column[] = [
  { title: 'Check', flex: 3.2 },
  { title: 'Value', flex: 1.5, align: 'right' },
  { title: 'Limit', flex: 1.6, align: 'right' },
  { title: 'Utilisation', flex: 1.1, align: 'right' },
  { title: 'Result', width: 40, align: 'center' },
];

/** Utilisation is explained once, under the heading, in the words the table uses. */
const UTILISATION_NOTE =
  'Utilisation is value ÷ limit for an upper limit and limit ÷ value for a lower one; for a temperature it is the rise above ambient ÷ the allowed rise. Above 100 % fails. [n] after a check is its source under References.';

/** Results against the acceptance criteria: one row per check with a worded verdict. */
export function summaryBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const ev = sheet.evaluation;
  const heading = headingBlock(ctx, 'summary-h', 'Summary of checks');
  if (!ev) {
    return [
      heading,
      paragraphBlock(
        ctx,
        'summary-none',
        'This revision has not been evaluated yet: no results to report.',
        { fontSize: 8.5, color: colours.muted },
      ),
    ];
  }
  const failed = ev.checks.filter((c) => !c.pass).length;
  const verdict = failed === 0 ? 'all pass' : `${failed} FAIL`;
  const minor = ev.checks.filter(isMinorCheck).length;
  const moved =
    minor === 0
      ? ''
      : ` ${minor === 1 ? 'One check passes' : `${minor} checks pass`} at ${pct(MINOR_UTILISATION)} utilisation or less: listed under "Minor checks" after the derivation.`;
  const tail = (failed > 0 ? ' — see "Justification for failed checks".' : '.') + moved;
  const intro = `${ev.checks.length} checks: ${verdict}${tail} ${UTILISATION_NOTE}`;
  const verdictHeight = ctx.m.lineHeight({ fontSize: 7.5, weight: 700 }) + 2;
  const blocks: FlowBlock[] = [
    heading,
    {
      key: 'summary-intro',
      height: ctx.m.height(intro, ctx.width, { fontSize: 8.5 }) + 4,
      element: (
        <Text key="summary-intro" style={{ marginBottom: 4 }}>
          {ev.checks.length} checks:{' '}
          <Text style={{ fontWeight: 700, color: failed ? colours.fail : colours.pass }}>
            {verdict}
          </Text>
          {tail} {UTILISATION_NOTE}
        </Text>
      ),
      keepWithNext: true,
    },
    ...tableBlocks(ctx, 'summary', {
      columns: SUMMARY_COLUMNS,
      continuedTitle: 'Summary of checks',
      rows: ev.checks.filter((c) => !isMinorCheck(c)).map((c) => checkRow(c, sheet, verdictHeight)),
    }),
  ];
  // The cautions every evaluation carries are printed once, in the caution block above.
  const notes = ev.warnings.filter((w) => !isSafetyCaution(w));
  if (notes.length > 0) {
    blocks.push(
      paragraphBlock(ctx, 'notes-h', 'Notes from the calculation', { fontSize: 8.5, weight: 700 }),
    );
    blocks[blocks.length - 1].keepWithNext = true;
    notes.forEach((w, i) =>
      blocks.push(
        paragraphBlock(ctx, `note-${i}`, `• ${w}`, {
          fontSize: 8.5,
          marginBottom: i === notes.length - 1 ? 4 : 0,
        }),
      ),
    );
  }
  return blocks;
}
