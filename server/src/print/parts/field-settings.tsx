import type { SheetEvaluation } from '@holdfast/calc';
import { Text, View } from '@react-pdf/renderer';
import { pct, qtyParts, qty, unitLabel } from '../format.js';
import type { PrintableSheet, PrintUnitSystem } from '../printable-sheet.js';
import { colours } from '../theme.js';
import { limitText } from './summary.js';
import { Heading, Table, type Column } from './table.js';

type EvalTable = SheetEvaluation['tables'][number];

/** A calc table (e.g. the spring setting table) with every column in the sheet's units. */
export function SettingTable(props: {
  table: EvalTable;
  system: PrintUnitSystem;
  extra?: Column[];
}) {
  const { table, system } = props;
  const columns: Column[] = table.columns.map((c) => {
    const unit = unitLabel(c.dimension, system);
    return { title: unit ? `${c.label} (${unit})` : c.label, flex: 1, align: 'right' as const };
  });
  const extra = props.extra ?? [];
  return (
    <View>
      <Heading level={2}>{table.title}</Heading>
      <Table
        columns={[...columns, ...extra]}
        rows={table.rows.map((row) => [
          ...table.columns.map((c) => qtyParts(row[c.key], c.dimension, system).text),
          ...extra.map(() => ''),
        ])}
      />
    </View>
  );
}

/** Field settings and tables as printed in the calculation sheet. */
export function FieldSettings(props: { sheet: PrintableSheet }) {
  const { sheet } = props;
  const ev = sheet.evaluation;
  if (!ev || (ev.fieldSettings.length === 0 && ev.tables.length === 0)) return null;
  return (
    <View>
      <Heading>Field settings</Heading>
      <Text style={{ fontSize: 7.5, marginBottom: 3 }}>
        The values the field team sets and measures. The field setting card carries the same values
        with room to record what was measured.
      </Text>
      {ev.fieldSettings.length > 0 && (
        <Table
          columns={[
            { title: 'Setting', flex: 2.6 },
            { title: 'Value', flex: 1.2, align: 'right' },
            { title: 'Note', flex: 3 },
          ]}
          rows={ev.fieldSettings.map((f) => [
            f.label,
            qty(f.value, f.dimension, sheet.unitSystem),
            f.note ?? '',
          ])}
        />
      )}
      {ev.tables.map((t) => (
        <SettingTable key={t.id} table={t} system={sheet.unitSystem} />
      ))}
    </View>
  );
}

/** The author's reasons for submitting with failed checks. */
export function Justification(props: { sheet: PrintableSheet }) {
  const { sheet } = props;
  const failed = sheet.evaluation?.checks.filter((c) => !c.pass) ?? [];
  if (failed.length === 0) return null;
  return (
    <View wrap={false}>
      <Heading>Justification for failed checks</Heading>
      {failed.map((c) => (
        <View key={c.id} style={{ marginBottom: 2 }}>
          <Text style={{ color: colours.fail, fontWeight: 700 }}>
            FAIL — {c.label}: {qty(c.value, c.dimension, sheet.unitSystem)} against{' '}
            {limitText(c, sheet)} ({pct(c.utilisation)})
          </Text>
          {c.message && c.message !== c.label && (
            <Text style={{ color: colours.muted }}>{c.message}</Text>
          )}
        </View>
      ))}
      <View style={{ borderLeftWidth: 2, borderColor: colours.rule, paddingLeft: 6, marginTop: 4 }}>
        <Text>{sheet.justification ?? 'No justification was recorded with this revision.'}</Text>
      </View>
    </View>
  );
}
