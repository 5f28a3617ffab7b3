import { Badge, Button, Select, Stack, Table, Text, TextInput } from '@mantine/core';
import type { CriterionConfirmation, CriterionValueInput } from '@holdfast/shared';
import { criterionDisplay } from '../../../components/calc/utils/criterion-value';
import { fitWidth } from '../../../lib/fit-width';
import { isoDay } from '../../../lib/dates';

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

const STANDINGS = (Object.keys(CONFIDENCE_WORD) as CriterionValueInput['confidence'][]).map(
  (value) => ({ value, label: CONFIDENCE_WORD[value] }),
);

export interface CriteriaValuesTableProps {
  values: CriterionValueInput[];
  /** When given, value, source and standing become editable. */
  onEdit?: (index: number, patch: Partial<CriterionValueInput>) => void;
  /** Server field errors by path relative to the list, e.g. '3.value'. */
  errors?: Record<string, string>;
  /** Documents that confirm values of the version shown. */
  confirmations?: CriterionConfirmation[];
  /** When given, each value offers "Confirm against a document". */
  onConfirm?: (value: CriterionValueInput) => void;
}

/** The standing badge: the confirming document when there is one, else how sure the value is. */
function Standing({ v, c }: { v: CriterionValueInput; c: CriterionConfirmation | undefined }) {
  if (c) {
    return (
      <Stack gap={2}>
        <Badge size="sm" variant="light" color="pass" data-confirmed>
          Confirmed
        </Badge>
        <Text size="xs" c="dimmed">
          {c.document}, {c.clause} — {c.confirmedBy.initials}, {isoDay(c.confirmedAt)}
        </Text>
      </Stack>
    );
  }
  return (
    <Badge size="sm" variant="light" color={CONFIDENCE_COLOR[v.confidence]}>
      {CONFIDENCE_WORD[v.confidence]}
    </Badge>
  );
}

/** Every acceptance value with its unit, where it comes from, and how sure that is. */
export function CriteriaValuesTable({
  values,
  onEdit,
  errors = {},
  confirmations = [],
  onConfirm,
}: CriteriaValuesTableProps) {
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
                    error={errors[`${i}.value`]}
                    styles={{
                      input: {
                        textAlign: 'right',
                        fontFamily: 'var(--mantine-font-family-monospace)',
                      },
                    }}
                  />
                ) : (
                  criterionDisplay(v).number
                )}
              </Table.Td>
              <Table.Td ff="monospace">
                {(onEdit ? v.unit : criterionDisplay(v).unit) || '—'}
              </Table.Td>
              <Table.Td>
                {onEdit ? (
                  <TextInput
                    size="xs"
                    aria-label={`${v.label} source`}
                    defaultValue={v.source}
                    onChange={(e) => onEdit(i, { source: e.currentTarget.value })}
                    error={errors[`${i}.source`]}
                  />
                ) : (
                  v.source
                )}
              </Table.Td>
              <Table.Td>
                {onEdit ? (
                  <Select
                    size="xs"
                    aria-label={`${v.label} standing`}
                    data={STANDINGS}
                    w={fitWidth(
                      STANDINGS.map((o) => o.label),
                      120,
                    )}
                    value={v.confidence}
                    allowDeselect={false}
                    onChange={(c) =>
                      c && onEdit(i, { confidence: c as CriterionValueInput['confidence'] })
                    }
                    error={errors[`${i}.confidence`]}
                  />
                ) : (
                  <Stack gap={4} align="flex-start">
                    <Standing v={v} c={confirmations.find((c) => c.key === v.key)} />
                    {onConfirm ? (
                      <Button size="compact-xs" variant="subtle" onClick={() => onConfirm(v)}>
                        Confirm against a document
                      </Button>
                    ) : null}
                  </Stack>
                )}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
