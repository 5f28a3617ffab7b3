import type { CheckResult } from '@holdfast/calc';
import { Text, View } from '@react-pdf/renderer';
import { pct, qty } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { colours } from '../theme.js';
import { Heading, Table, Verdict } from './table.js';

/** 'Limit' column text: ≤ for maxima, ≥ for minima, in the sheet's units. */
export function limitText(c: CheckResult, sheet: PrintableSheet): string {
  return `${c.kind === 'max' ? '≤' : '≥'} ${qty(c.limit, c.dimension, sheet.unitSystem)}`;
}

export function Purpose(props: { sheet: PrintableSheet }) {
  return (
    <View>
      <Heading>Purpose</Heading>
      <Text>{props.sheet.purpose}</Text>
    </View>
  );
}

/** Results against the acceptance criteria: one row per check with a worded verdict. */
export function Summary(props: { sheet: PrintableSheet }) {
  const { sheet } = props;
  const ev = sheet.evaluation;
  if (!ev) {
    return (
      <View>
        <Heading>Summary of checks</Heading>
        <Text style={{ color: colours.muted }}>
          This revision has not been evaluated yet: no results to report.
        </Text>
      </View>
    );
  }
  const failed = ev.checks.filter((c) => !c.pass).length;
  return (
    <View>
      <Heading>Summary of checks</Heading>
      <Text style={{ marginBottom: 4 }}>
        {ev.checks.length} checks:{' '}
        <Text style={{ fontWeight: 700, color: failed ? colours.fail : colours.pass }}>
          {failed === 0 ? 'all pass' : `${failed} FAIL`}
        </Text>
        {failed > 0 ? ' — see "Justification for failed checks".' : '.'} Utilisation is value ÷
        limit for an upper limit and limit ÷ value for a lower one; above 100 % fails.
      </Text>
      <Table
        columns={[
          { title: 'Check', flex: 3.2 },
          { title: 'Value', flex: 1.5, align: 'right' },
          { title: 'Limit', flex: 1.6, align: 'right' },
          { title: 'Utilisation', flex: 1.1, align: 'right' },
          { title: 'Result', width: 40, align: 'center' },
        ]}
        rows={ev.checks.map((c) => [
          c.label,
          qty(c.value, c.dimension, sheet.unitSystem),
          limitText(c, sheet),
          pct(c.utilisation),
          <Verdict key={c.id} pass={c.pass} />,
        ])}
      />
      {ev.warnings.length > 0 && (
        <View style={{ marginBottom: 4 }}>
          <Text style={{ fontWeight: 700 }}>Notes from the calculation</Text>
          {ev.warnings.map((w) => (
            <Text key={w}>• {w}</Text>
          ))}
        </View>
      )}
    </View>
  );
}
