import { Stack, Table, Text, Title } from '@mantine/core';
import type { Dimension, SheetEvaluation } from '@holdfast/calc';
import { presentSetting, presentSI, type UnitSystem } from '../utils/units';

/**
 * The numbers the field team sets and measures, and the setting tables, to the same figures as
 * the printed field card and sheet (each setting to the step a fitter sets it by).
 */
export function FieldSettingsView({
  evaluation,
  unitSystem,
}: {
  evaluation: SheetEvaluation;
  unitSystem: UnitSystem;
}) {
  const { fieldSettings, tables } = evaluation;
  if (fieldSettings.length === 0 && tables.length === 0) {
    return <Text c="dimmed">No field settings for this sheet type.</Text>;
  }
  return (
    <Stack gap="md">
      {fieldSettings.length > 0 ? (
        <Table withTableBorder verticalSpacing={6} fz="sm" aria-label="Field settings">
          <Table.Tbody>
            {fieldSettings.map((s) => (
              <Table.Tr key={s.key} data-setting={s.key}>
                <Table.Td>
                  {s.label}
                  {s.note ? (
                    <Text size="xs" c="dimmed">
                      {s.note}
                    </Text>
                  ) : null}
                </Table.Td>
                <Table.Td ff="monospace" ta="right" style={{ whiteSpace: 'nowrap' }}>
                  {presentSetting(s.value, s.key, s.dimension as Dimension, unitSystem).text}
                </Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      ) : null}
      {tables.map((table) => {
        const heads = table.columns.map((c) => {
          const unit = presentSI(1, c.dimension as Dimension, unitSystem).unit;
          return { ...c, unitLabel: unit };
        });
        return (
          <div key={table.id}>
            <Title order={4} size="h6" mb={4}>
              {table.title}
            </Title>
            <Table withTableBorder striped fz="sm" aria-label={table.title}>
              <Table.Thead>
                <Table.Tr>
                  {heads.map((c) => (
                    <Table.Th key={c.key} ta="right">
                      {c.label}
                      {c.unitLabel ? ` (${c.unitLabel})` : ''}
                    </Table.Th>
                  ))}
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {table.rows.map((row, i) => (
                  <Table.Tr key={i}>
                    {heads.map((c) => (
                      <Table.Td key={c.key} ff="monospace" ta="right">
                        {
                          presentSetting(
                            row[c.key] ?? Number.NaN,
                            c.key,
                            c.dimension as Dimension,
                            unitSystem,
                          ).number
                        }
                      </Table.Td>
                    ))}
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </div>
        );
      })}
    </Stack>
  );
}
