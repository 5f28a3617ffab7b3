import { formatForDerivation, type DerivationStep } from '@holdfast/calc';
import { View } from '@react-pdf/renderer';
import { Text } from '../text.js';
import { qty } from '../format.js';
import { headingBlock, paragraphBlock, type BlockContext } from '../blocks.js';
import type { FlowBlock } from '../flow.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { ROW_RULE, colours, monoFont, ruledRow } from '../theme.js';

const NUM_W = 26;
const REF_W = 150;

/**
 * The result in the units its substitution used (rad/s stays rad/s, not rpm, inside a step);
 * on a US sheet the US value first, the same SI value in brackets.
 */
function resultText(step: DerivationStep, sheet: PrintableSheet): string {
  const si = formatForDerivation(step.value, step.dimension);
  const shown = sheet.unitSystem === 'US' ? qty(step.value, step.dimension, 'US') : si;
  return `${step.symbol} = ${shown}${shown !== si ? `  (${si})` : ''}`;
}

function Step(props: { step: DerivationStep; n: string; sheet: PrintableSheet }) {
  const { step, sheet } = props;
  const mono = { ...monoFont, fontSize: 7.6 } as const;
  return (
    <View wrap={false} style={{ ...ruledRow, paddingVertical: 3 }}>
      <Text style={{ width: NUM_W, color: colours.muted, fontSize: 7 }}>{props.n}</Text>
      {/* One Text per line: a '\n' has no glyph in any font and would pull in Helvetica. */}
      <View style={{ flex: 1 }}>
        <Text style={{ fontWeight: 600 }}>{step.label}</Text>
        <Text style={mono}>{step.formula}</Text>
        <Text style={{ ...mono, color: colours.muted }}>{step.substituted}</Text>
        <Text style={{ ...mono, fontWeight: 700 }}>{resultText(step, sheet)}</Text>
      </View>
      <Text style={{ width: REF_W, fontSize: 6.8, color: colours.muted, paddingLeft: 6 }}>
        {step.reference}
      </Text>
    </View>
  );
}

function stepHeight(ctx: BlockContext, step: DerivationStep, sheet: PrintableSheet): number {
  const { m } = ctx;
  const w = ctx.width - NUM_W - REF_W;
  const mono = { fontSize: 7.6, mono: true };
  const left =
    m.height(step.label, w, { fontSize: 8.5, weight: 600 }) +
    m.height(step.formula, w, mono) +
    m.height(step.substituted, w, mono) +
    m.height(resultText(step, sheet), w, { ...mono, weight: 700 });
  const right = m.height(step.reference, REF_W - 6, { fontSize: 6.8 });
  // 2 × 3 pt padding and the rule below.
  return Math.max(left, right) + 6 + ROW_RULE;
}

function derivationIntro(sheet: PrintableSheet): string {
  return `Each step: formula, the values put in (SI), the result${
    sheet.unitSystem === 'US' ? ' in US units with SI in brackets' : ''
  }, and the reference.`;
}

/**
 * The derivation as blocks: numbered steps grouped by section in the sheet type's order; a
 * section that runs on to the next page repeats its heading "(continued)".
 */
export function derivationBlocks(ctx: BlockContext, sheet: PrintableSheet): FlowBlock[] {
  const steps = sheet.evaluation?.derivation ?? [];
  if (steps.length === 0) return [];
  const order = sheet.sections.map((x) => x.id);
  const rank = (id: string) => (order.indexOf(id) === -1 ? order.length : order.indexOf(id));
  const ids = [...new Set(steps.map((s) => s.section))].sort((a, b) => rank(a) - rank(b));
  const title = (id: string) => sheet.sections.find((x) => x.id === id)?.title ?? titleCase(id);
  const intro = derivationIntro(sheet);
  const blocks: FlowBlock[] = [
    headingBlock(ctx, 'derivation-h', 'Derivation'),
    {
      ...paragraphBlock(ctx, 'derivation-intro', intro, {
        fontSize: 7,
        color: colours.muted,
        marginBottom: 2,
      }),
      keepWithNext: true,
    },
  ];
  ids.forEach((id, si) => {
    const text = `${si + 1}. ${title(id)}`;
    blocks.push(headingBlock(ctx, `section-${id}`, text, 2));
    const carry = [headingBlock(ctx, `section-${id}-cont`, `${text} (continued)`, 2)];
    steps
      .filter((s) => s.section === id)
      .forEach((step, i) =>
        blocks.push({
          key: step.id,
          height: stepHeight(ctx, step, sheet),
          element: <Step key={step.id} step={step} n={`${si + 1}.${i + 1}`} sheet={sheet} />,
          carry,
        }),
      );
  });
  return blocks;
}

function titleCase(id: string): string {
  const words = id.replace(/[-_]/g, ' ').replace(/([a-z])([A-Z])/g, '$1 $2');
  return words.charAt(0).toUpperCase() + words.slice(1);
}
