import { Table, Text } from '@mantine/core';
import {
  readingPrecision,
  settingPrecision,
  toDisplay,
  toleranceText,
  type Dimension,
} from '@holdfast/calc';
import type { FieldMeasurement } from '@holdfast/shared';

/**
 * A value in its display unit, as on the printed record: a target to the step it is set by, a
 * reading to a tenth of that step.
 */
function shown(m: FieldMeasurement, valueSI: number | null, of: 'target' | 'reading'): string {
  if (valueSI === null) return '—';
  const dim = m.dimension as Dimension;
  const precision = (of === 'target' ? settingPrecision : readingPrecision)(m.settingKey, dim);
  return toDisplay(valueSI, dim, 'SI', undefined, precision).text;
}

/** The values of a record as measured, for whoever reads or countersigns it on screen. */
export function RecordValues({ measurements }: { measurements: readonly FieldMeasurement[] }) {
  const measured = measurements.filter((m) => m.asFound !== null || m.asLeft !== null);
  if (measured.length === 0) return <Text size="sm">No value measured.</Text>;
  return (
    <Table.ScrollContainer minWidth={500}>
      <Table fz="sm" verticalSpacing={2} withRowBorders={false} aria-label="Values measured">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Value</Table.Th>
            <Table.Th ta="right">Target</Table.Th>
            <Table.Th>Tolerance</Table.Th>
            <Table.Th ta="right" style={{ whiteSpace: 'nowrap' }}>
              As found
            </Table.Th>
            <Table.Th ta="right">As left</Table.Th>
            <Table.Th>As left is</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {measured.map((m) => (
            <Table.Tr key={m.settingKey}>
              <Table.Td>{m.label}</Table.Td>
              <Table.Td ta="right" style={{ whiteSpace: 'nowrap' }}>
                {shown(m, m.target, 'target')}
              </Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>
                {m.tolerance
                  ? toleranceText(m.tolerance, m.dimension as Dimension, 'SI', m.settingKey)
                  : '—'}
              </Table.Td>
              <Table.Td ta="right" style={{ whiteSpace: 'nowrap' }}>
                {shown(m, m.asFound, 'reading')}
              </Table.Td>
              <Table.Td ta="right" style={{ whiteSpace: 'nowrap' }}>
                {shown(m, m.asLeft, 'reading')}
              </Table.Td>
              <Table.Td c={m.asLeftVerdict?.status === 'out' ? 'fail.8' : undefined}>
                {m.asLeftVerdict === null
                  ? '—'
                  : m.asLeftVerdict.status === 'in'
                    ? 'within'
                    : `OUT: ${m.reason}`}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
