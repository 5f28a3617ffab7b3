import { headingBlock, tableBlocks, type BlockContext } from '../blocks.js';
import type { FlowBlock } from '../flow.js';
import type { PrintableInput, PrintableSheet } from '../printable-sheet.js';

/**
 * Words for an input the sheet holds but does not use: one that belongs to a flag left off (the
 * clearance with no lift stop, where it follows from the stroke; a stack the sheet leaves out).
 * A checker reading 0.8 mm among the inputs must not think the sheet worked with it.
 */
function unusedWords(i: PrintableInput, sheet: PrintableSheet): string | null {
  const flagKey = i.field.requiredIf;
  if (!flagKey) return null;
  const flag = sheet.inputs.find((x) => x.field.key === flagKey);
  if (!flag || flag.value !== false) return null;
  // The flag's words without their explanation: 'Thruster has a lift stop: No'.
  const flagWords = flag.field.label.replace(/\s*\(.*\)\s*$/, '');
  return `not used (${flagWords}: No)`;
}

function labelOf(i: PrintableInput, sheet: PrintableSheet): string {
  const unused = unusedWords(i, sheet);
  return unused ? `${i.field.label} — ${unused}` : i.field.label;
}

/** Inputs grouped by section, as typed and in the sheet's unit system. */
export function inputsBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const sections = sheet.sections.filter((sec) =>
    sheet.inputs.some((i) => i.field.section === sec.id),
  );
  const orphans = sheet.inputs.filter(
    (i) => !sheet.sections.some((sec) => sec.id === i.field.section),
  );
  const groups = [
    ...sections.map((sec) => ({
      title: sec.title,
      items: sheet.inputs.filter((i) => i.field.section === sec.id),
    })),
    ...(orphans.length ? [{ title: 'Other', items: orphans }] : []),
  ];
  const blocks: FlowBlock[] = [headingBlock(ctx, 'inputs-h', 'Inputs')];
  groups.forEach((g, k) => {
    blocks.push(
      headingBlock(ctx, `inputs-${k}-h`, g.title, 2),
      ...tableBlocks(ctx, `inputs-${k}`, {
        continuedTitle: g.title,
        columns: [
          { title: 'Input', flex: 3.2 },
          { title: 'Symbol', flex: 0.9, mono: true },
          { title: 'As entered', flex: 2, align: 'right' },
          {
            title: sheet.unitSystem === 'US' ? 'In US units' : 'In SI units',
            flex: 1.4,
            align: 'right',
          },
        ],
        rows: g.items.map((i) => [
          labelOf(i, sheet),
          i.field.symbol,
          i.entered,
          // Only quantities change with the unit system; the rest would just repeat.
          i.field.kind === 'quantity' ? i.converted : '',
        ]),
      }),
    );
  });
  return blocks;
}
