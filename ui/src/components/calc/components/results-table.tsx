import { Table, Text, Title } from '@mantine/core';
import type { Dimension, ResultValue, SectionDefinition } from '@holdfast/calc';
import { SymbolText } from './symbol-text';
import { presentPrinted, type UnitSystem } from '../utils/units';

export interface ResultsTableProps {
  results: ResultValue[];
  sections: SectionDefinition[];
  unitSystem: UnitSystem;
}

/** Named results by section, each number with its unit in the chosen system. */
export function ResultsTable({ results, sections, unitSystem }: ResultsTableProps) {
  const order = sectionOrder(
    sections,
    results.map((r) => r.section),
  );
  return (
    <>
      {order.map((section) => {
        const rows = results.filter((r) => r.section === section.id);
        if (rows.length === 0) return null;
        return (
          <div key={section.id}>
            <Title order={4} size="h6" mt="sm" mb={4}>
              {section.title}
            </Title>
            <Table striped highlightOnHover withRowBorders={false} verticalSpacing={4} fz="sm">
              <Table.Tbody>
                {rows.map((r) => {
                  const d = presentPrinted(r.value, r.dimension as Dimension, unitSystem);
                  return (
                    <Table.Tr key={r.key} data-result={r.key}>
                      <Table.Td>{r.label}</Table.Td>
                      <Table.Td ff="monospace" c="dimmed" w={90}>
                        <SymbolText symbol={r.symbol} />
                      </Table.Td>
                      <Table.Td ff="monospace" ta="right" style={{ whiteSpace: 'nowrap' }}>
                        {d.number}
                        <Text span c="dimmed" ff="monospace" size="sm">
                          {d.unit ? ` ${d.unit}` : ''}
                        </Text>
                      </Table.Td>
                    </Table.Tr>
                  );
                })}
              </Table.Tbody>
            </Table>
          </div>
        );
      })}
    </>
  );
}

/** Sections in the type's order, then any section only the results name. */
export function sectionOrder(sections: SectionDefinition[], used: string[]): SectionDefinition[] {
  const known = new Set(sections.map((s) => s.id));
  const extra = [...new Set(used.filter((id) => !known.has(id)))].map((id) => ({
    id,
    title: titleCase(id),
  }));
  return [...sections, ...extra];
}

function titleCase(id: string): string {
  const words = id.replace(/[-_]/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}
