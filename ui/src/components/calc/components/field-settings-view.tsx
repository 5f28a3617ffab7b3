import { Stack, Table, Text, Title } from '@mantine/core';
import {
  bandOf,
  bandSentence,
  getSheetType,
  rowVerdictText,
  settingTableRows,
  settingTableTitle,
  toleranceBeyondBand,
  type Dimension,
  type SettingBand,
  type SheetEvaluation,
} from '@holdfast/calc';
import { presentSetting, presentSI, type UnitSystem } from '../utils/units';

/**
 * The numbers the field team sets and measures, and the setting tables, to the same figures as
 * the printed field card and sheet (each setting to the step a fitter sets it by).
 */
export function FieldSettingsView({
  evaluation,
  bands,
  unitSystem,
}: {
  evaluation: SheetEvaluation;
  /** The setting tables checked row by row against the whole sheet, when known. */
  bands?: SettingBand[];
  unitSystem: UnitSystem;
}) {
  const { fieldSettings, tables } = evaluation;
  const fieldCard = getSheetType(evaluation.sheetType)?.fieldCard;
  // The bands given (worked out live, or stored with the record) stand for the evaluation's own.
  const banded = { ...evaluation, ...(bands ? { settingBands: bands } : {}) };
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
        const band = bandOf(banded, table.id);
        const rows = settingTableRows(banded, table, unitSystem);
        const narrowed = band ? toleranceBeyondBand(banded, table, fieldCard, unitSystem) : [];
        return (
          <div key={table.id}>
            <Title order={4} size="h6" mb={4}>
              {settingTableTitle(table.title, unitSystem)}
            </Title>
            {band ? (
              <Text size="sm" mb={6} data-testid="setting-band">
                {bandSentence(band, unitSystem, banded)}
              </Text>
            ) : null}
            {narrowed.map((line) => (
              <Text
                key={line}
                size="sm"
                mb={6}
                fw={700}
                c="amber.9"
                data-testid="tolerance-narrowed"
              >
                Tolerance narrowed: {line}
              </Text>
            ))}
            <Table
              withTableBorder
              striped
              fz="sm"
              aria-label={settingTableTitle(table.title, unitSystem)}
            >
              <Table.Thead>
                <Table.Tr>
                  {heads.map((c) => (
                    <Table.Th key={c.key} ta="right">
                      {c.label}
                      {c.unitLabel ? ` (${c.unitLabel})` : ''}
                    </Table.Th>
                  ))}
                  {band ? <Table.Th>Other checks at this setting</Table.Th> : null}
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {rows.map((row, i) => (
                  <Table.Tr
                    key={i}
                    data-band-mark={row.marks.length ? row.marks.join(',') : undefined}
                    fw={row.marks.length ? 600 : undefined}
                  >
                    {heads.map((c) => (
                      <Table.Td key={c.key} ff="monospace" ta="right">
                        {
                          presentSetting(
                            row.values[c.key] ?? Number.NaN,
                            c.key,
                            c.dimension as Dimension,
                            unitSystem,
                          ).number
                        }
                      </Table.Td>
                    ))}
                    {band ? (
                      <Table.Td
                        fz="xs"
                        c={row.failing?.length ? 'var(--mantine-color-fail-8)' : undefined}
                      >
                        {rowVerdictText(row)}
                      </Table.Td>
                    ) : null}
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
