import type { DerivationStep } from '@holdfast/calc';
import { Text, View } from '@react-pdf/renderer';
import { qty } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours, monoFont } from '../theme.js';
import { Heading } from './table.js';

function Step(props: { step: DerivationStep; n: string; sheet: PrintableSheet }) {
  const { step, sheet } = props;
  const shown = qty(step.value, step.dimension, sheet.unitSystem);
  const si = qty(step.value, step.dimension, 'SI');
  const mono = { ...monoFont, fontSize: 7.6 } as const;
  return (
    <View
      wrap={false}
      style={{ flexDirection: 'row', borderBottomWidth: 0.4, borderColor: colours.rule, paddingVertical: 3 }}
    >
      <Text style={{ width: 26, color: colours.muted, fontSize: 7 }}>{props.n}</Text>
      {/* One paragraph with spans: a quarter of the layout nodes of one Text per line. */}
      <Text style={{ flex: 1 }}>
        <Text style={{ fontWeight: 600 }}>{step.label}</Text>
        {'\n'}
        <Text style={mono}>{step.formula}</Text>
        {'\n'}
        <Text style={{ ...mono, color: colours.muted }}>{step.substituted}</Text>
        {'\n'}
        <Text style={{ ...mono, fontWeight: 700 }}>
          {step.symbol} = {shown}
          {shown !== si ? `  (${si})` : ''}
        </Text>
      </Text>
      <Text style={{ width: 150, fontSize: 6.8, color: colours.muted, paddingLeft: 6 }}>
        {step.reference}
      </Text>
    </View>
  );
}

/** Every derivation step, grouped by section in the sheet type's order. */
export function Derivation(props: { sheet: PrintableSheet }) {
  const { sheet } = props;
  const steps = sheet.evaluation?.derivation ?? [];
  if (steps.length === 0) return null;
  const order = sheet.sections.map((x) => x.id);
  const sectionIds = [...new Set(steps.map((s) => s.section))].sort(
    (a, b) => rank(order, a) - rank(order, b),
  );
  const title = (id: string) => sheet.sections.find((x) => x.id === id)?.title ?? titleCase(id);
  return (
    <View>
      <Heading>Derivation</Heading>
      <Text style={{ fontSize: 7, color: colours.muted, marginBottom: 2 }}>
        Each step: formula, the values put in (SI), the result
        {sheet.unitSystem === 'US' ? ' in US units with SI in brackets' : ''}, and the reference.
      </Text>
      {sectionIds.map((id, si) => (
        <View key={id}>
          <Heading level={2}>
            {si + 1}. {title(id)}
          </Heading>
          {steps
            .filter((s) => s.section === id)
            .map((s, i) => (
              <Step key={s.id} step={s} n={`${si + 1}.${i + 1}`} sheet={sheet} />
            ))}
        </View>
      ))}
    </View>
  );
}

function rank(order: string[], id: string): number {
  const i = order.indexOf(id);
  return i === -1 ? order.length : i;
}

function titleCase(id: string): string {
  const words = id.replace(/[-_]/g, ' ').replace(/([a-z])([A-Z])/g, '$1 $2');
  return words.charAt(0).toUpperCase() + words.slice(1);
}
