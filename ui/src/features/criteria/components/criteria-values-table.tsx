import { Badge, Table, TextInput } from '@mantine/core';
import type { CriterionValueInput } from '@holdfast/shared';
import { dimensionOfSIUnit } from '../../calc/utils/format-si';
import { presentSI } from '../../calc/utils/units';

/**
 * A stored criterion (SI) in the trade's units, e.g. 2 100 000 Pa·m/s → 2.100 MPa·m/s. Editing
 * stays in the stored SI unit, so what is typed is what is stored.
 */
function tradeValue(v: CriterionValueInput): { number: string; unit: string } {
  const dimension = dimensionOfSIUnit(v.unit);
  if (!dimension) return { number: String(v.value), unit: v.unit };
  return presentSI(v.value, dimension, 'SI');
}

const CONFIDENCE_COLOR: Record<CriterionValueInput['confidence'], string> = {
  published: 'pass',
  secondary: 'steel',
  'common practice': 'amber',
  memory: 'fail',
};

const CONFIDENCE_WORD: Record<CriterionValueInput['confidence'], string> = {
  published: 'Published',
  secondary: 'Secondary copy',
  'common practice': 'Common practice',
  memory: 'From memory',
};

export interface CriteriaValuesTableProps {
  values: CriterionValueInput[];
  /** When given, value and source become editable. */
  onEdit?: (index: number, patch: Partial<CriterionValueInput>) => void;
}

/** Every acceptance value with its unit, where it comes from, and how sure that is. */
export function CriteriaValuesTable({ values, onEdit }: CriteriaValuesTableProps) {
  return (
    <Table.ScrollContainer minWidth={760}>
      <Table fz="sm" verticalSpacing={6} striped aria-label="Criteria values">
        <Table.Thead>
          <Table.Tr>
            <Table.Th w="30%">Criterion</Table.Th>
            <Table.Th ta="right" w={110}>
              Value
            </Table.Th>
            <Table.Th w={90}>Unit</Table.Th>
            <Table.Th>Source</Table.Th>
            <Table.Th w={160}>Standing</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {values.map((v, i) => (
            <Table.Tr key={v.key} data-criterion={v.key}>
              <Table.Td>{v.label}</Table.Td>
              <Table.Td ta="right" ff="monospace">
                {onEdit ? (
                  <TextInput
                    size="xs"
                    aria-label={`${v.label} value`}
                    inputMode="decimal"
                    defaultValue={String(v.value)}
                    onChange={(e) => onEdit(i, { value: Number(e.currentTarget.value) })}
                    styles={{
                      input: {
                        textAlign: 'right',
                        fontFamily: 'var(--mantine-font-family-monospace)',
                      },
                    }}
                  />
                ) : (
                  tradeValue(v).number
                )}
              </Table.Td>
              <Table.Td ff="monospace">{(onEdit ? v.unit : tradeValue(v).unit) || '—'}</Table.Td>
              <Table.Td>
                {onEdit ? (
                  <TextInput
                    size="xs"
                    aria-label={`${v.label} source`}
                    defaultValue={v.source}
                    onChange={(e) => onEdit(i, { source: e.currentTarget.value })}
                  />
                ) : (
                  v.source
                )}
              </Table.Td>
              <Table.Td>
                <Badge size="sm" variant="light" color={CONFIDENCE_COLOR[v.confidence]}>
                  {CONFIDENCE_WORD[v.confidence]}
                </Badge>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
