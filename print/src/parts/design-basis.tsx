import { criterionText } from '@holdfast/calc';
import { View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import { day } from '../format.js';
import type { PrintableSheet, PrintCriterion } from '../printable-sheet.js';
import { colours } from '../theme.js';
import { headingBlock, paragraphBlock, tableBlocks, type BlockContext } from '../blocks.js';
import type { FlowBlock } from '../flow.js';

/** Printed beside a value still recalled from memory, in the value cell itself. */
export const FROM_MEMORY_MARK = '[from memory]';

// Marked when recalled from memory, by its standing or in its source's own words.
const fromMemory = (v: PrintCriterion) =>
  !v.confirmation && (v.confidence === 'memory' || /from memory/i.test(v.source));

/** How sure the value is: the confirming document when there is one. */
function standing(v: PrintCriterion): string {
  const c = v.confirmation;
  return c ? `confirmed: ${c.document}, ${c.clause} (${c.by}, ${day(c.at)})` : v.confidence;
}

const KEY_W = 130;

function keyValueBlock(ctx: BlockContext, k: string, v: string): FlowBlock {
  const body = { fontSize: 8.5 };
  const height =
    Math.max(ctx.m.height(k, KEY_W, body), ctx.m.height(v, ctx.width - KEY_W, body)) + 1.5;
  return {
    key: `basis-${k}`,
    height,
    element: (
      <View key={`basis-${k}`} style={{ flexDirection: 'row', marginBottom: 1.5 }} wrap={false}>
        <Text style={{ width: KEY_W, color: colours.muted }}>{k}</Text>
        <Text style={{ flex: 1 }}>{v}</Text>
      </View>
    ),
  };
}

/** Which method, criteria and software this revision rests on. */
export function designBasisBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const c = sheet.criteria;
  const rows: [string, string][] = [
    ['Sheet type', `${sheet.sheetType.title} (${sheet.sheetType.id})`],
    ['Scope', sheet.sheetType.description],
    ['Acceptance criteria', `${c.name} (${c.id}), version ${c.version}`],
    ['Torque reference', sheet.designBasis.torqueReference],
    ['Efficiency treatment', sheet.designBasis.efficiencyTreatment],
    ['Calculation software', `Holdfast calculation core ${sheet.coreVersion ?? '(not evaluated)'}`],
    [
      'Unit system',
      sheet.unitSystem === 'US'
        ? 'US customary (inputs kept as typed)'
        : 'SI (inputs kept as typed)',
    ],
  ];
  const blocks = [
    headingBlock(ctx, 'basis-h', 'Design basis'),
    ...rows.map(([k, v]) => keyValueBlock(ctx, k, v)),
  ];
  if (c.listed === 'used' && c.values.length === 0) {
    blocks.push(
      paragraphBlock(
        ctx,
        'criteria-none',
        'No check of this sheet reads a value of the criteria set: each limit and its source are printed with its check.',
        { fontSize: 8.5, marginTop: 3 },
      ),
    );
  } else if (c.values.length > 0) {
    const title =
      c.listed === 'used'
        ? 'Criteria values this sheet uses, and their sources'
        : 'Criteria values and their sources (the whole set)';
    blocks.push(
      headingBlock(ctx, 'criteria-h', title, 2),
      ...tableBlocks(ctx, 'criteria', {
        continuedTitle: title,
        columns: [
          { title: 'Criterion', flex: 2.4 },
          { title: 'Value', flex: 1, align: 'right' },
          { title: 'Source', flex: 3.2 },
          { title: 'Confidence', flex: 1.1 },
        ],
        rows: c.values.map((v) => [
          v.label,
          fromMemory(v)
            ? `${criterionText(v.value, v.unit, sheet.unitSystem).text} ${FROM_MEMORY_MARK}`
            : criterionText(v.value, v.unit, sheet.unitSystem).text,
          v.source,
          standing(v),
        ]),
      }),
    );
  }
  return blocks;
}
