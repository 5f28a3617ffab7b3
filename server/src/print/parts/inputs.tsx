import { View } from '@react-pdf/renderer';
import type { PrintableSheet } from '../printable-sheet.js';
import { Heading, Table } from './table.js';

/** Inputs grouped by section, as typed and in the sheet's unit system. */
export function Inputs(props: { sheet: PrintableSheet }) {
  const { sheet } = props;
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
  return (
    <View>
      <Heading>Inputs</Heading>
      {groups.map((g) => (
        <View key={g.title}>
          <Heading level={2}>{g.title}</Heading>
          <Table
            columns={[
              { title: 'Input', flex: 3.2 },
              { title: 'Symbol', flex: 0.9, mono: true },
              { title: 'As entered', flex: 2, align: 'right' },
              {
                title: sheet.unitSystem === 'US' ? 'In US units' : 'In SI units',
                flex: 1.4,
                align: 'right',
              },
            ]}
            rows={g.items.map((i) => [
              i.field.label,
              i.field.symbol,
              i.entered,
              // Only quantities change with the unit system; the rest would just repeat.
              i.field.kind === 'quantity' ? i.converted : '',
            ])}
          />
        </View>
      ))}
    </View>
  );
}
