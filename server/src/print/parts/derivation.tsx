import type { DerivationStep } from '@holdfast/calc';
import { Text, View } from '@react-pdf/renderer';
import { qty } from '../format.js';
import { lineHeight, lines, packPages, type Block } from '../layout-plan.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours, monoFont } from '../theme.js';
import { Heading } from './table.js';

const NUM_W = 26;
const REF_W = 150;

export type DerivationItem =
  | { kind: 'title' }
  | { kind: 'heading'; text: string }
  | { kind: 'step'; step: DerivationStep; n: string };

function resultText(step: DerivationStep, sheet: PrintableSheet): string {
  const shown = qty(step.value, step.dimension, sheet.unitSystem);
  const si = qty(step.value, step.dimension, 'SI');
  return `${step.symbol} = ${shown}${shown !== si ? `  (${si})` : ''}`;
}

function Step(props: { step: DerivationStep; n: string; sheet: PrintableSheet }) {
  const { step, sheet } = props;
  const mono = { ...monoFont, fontSize: 7.6 } as const;
  return (
    <View
      wrap={false}
      style={{
        flexDirection: 'row',
        borderBottomWidth: 0.4,
        borderColor: colours.rule,
        paddingVertical: 3,
      }}
    >
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

function stepHeight(step: DerivationStep, sheet: PrintableSheet, width: number): number {
  const w = width - NUM_W - REF_W;
  const left =
    lines(step.label, w, 8.5) * lineHeight(8.5) +
    (lines(step.formula, w, 7.6, true) +
      lines(step.substituted, w, 7.6, true) +
      lines(resultText(step, sheet), w, 7.6, true)) *
      lineHeight(7.6, true);
  const right = lines(step.reference, REF_W - 6, 6.8) * lineHeight(6.8);
  return Math.max(left, right) + 6.4;
}

/**
 * Cuts the derivation into page-sized chunks, numbered steps grouped by section in the sheet
 * type's order; a section that runs on to the next chunk repeats its heading "(continued)".
 */
export function planDerivation(
  sheet: PrintableSheet,
  width: number,
  capacity: number,
): DerivationItem[][] {
  const steps = sheet.evaluation?.derivation ?? [];
  if (steps.length === 0) return [];
  const order = sheet.sections.map((x) => x.id);
  const rank = (id: string) => (order.indexOf(id) === -1 ? order.length : order.indexOf(id));
  const ids = [...new Set(steps.map((s) => s.section))].sort((a, b) => rank(a) - rank(b));
  const title = (id: string) => sheet.sections.find((x) => x.id === id)?.title ?? titleCase(id);
  const blocks: Block<DerivationItem & { section?: string }>[] = [
    { item: { kind: 'title' }, height: 44, keepWithNext: true },
  ];
  ids.forEach((id, si) => {
    const text = `${si + 1}. ${title(id)}`;
    blocks.push({ item: { kind: 'heading', text, section: text }, height: 20, keepWithNext: true });
    steps
      .filter((s) => s.section === id)
      .forEach((step, i) =>
        blocks.push({
          item: { kind: 'step', step, n: `${si + 1}.${i + 1}`, section: text },
          height: stepHeight(step, sheet, width),
        }),
      );
  });
  return packPages(blocks, capacity).map((page) => {
    const items = page.map((b) => b.item);
    const first = items[0];
    if (first.kind === 'step' && first.section) {
      items.unshift({ kind: 'heading', text: `${first.section} (continued)` });
    }
    return items;
  });
}

/** One chunk of the derivation (see planDerivation). */
export function DerivationChunk(props: { items: DerivationItem[]; sheet: PrintableSheet }) {
  const { sheet } = props;
  return (
    <View>
      {props.items.map((it, i) =>
        it.kind === 'title' ? (
          <View key="title">
            <Heading>Derivation</Heading>
            <Text style={{ fontSize: 7, color: colours.muted, marginBottom: 2 }}>
              Each step: formula, the values put in (SI), the result
              {sheet.unitSystem === 'US' ? ' in US units with SI in brackets' : ''}, and the
              reference.
            </Text>
          </View>
        ) : it.kind === 'heading' ? (
          <Heading key={`h${i}`} level={2}>
            {it.text}
          </Heading>
        ) : (
          <Step key={it.step.id} step={it.step} n={it.n} sheet={sheet} />
        ),
      )}
    </View>
  );
}

function titleCase(id: string): string {
  const words = id.replace(/[-_]/g, ' ').replace(/([a-z])([A-Z])/g, '$1 $2');
  return words.charAt(0).toUpperCase() + words.slice(1);
}
