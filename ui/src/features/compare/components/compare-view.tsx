import { Badge, Group, Paper, Table, Text, Title } from '@mantine/core';
import { IconArrowRight } from '@tabler/icons-react';
import type { Compare } from '@holdfast/shared';
import { formatNumber, type FieldDefinition } from '@holdfast/calc';
import { useCurrentUser } from '../../../lib/session';
import { asDimension, formatChange, formatSI } from '../../../components/calc/utils/format-si';
import type { UnitSystem } from '../../../components/calc/utils/units';
import { showStoredValue as show } from '../../../components/calc/utils/stored-value';
import { isQuantity, presentPrinted, unitLabel } from '../../../components/calc/utils/units';

type MovedResult = Compare['results'][number];
type ComparedCheck = Compare['checks'][number];

/** A result as the Results view and the printed sheet give it (1010 N, not 1007 N). */
function resultText(valueSI: number, r: MovedResult, system: UnitSystem): string {
  const d = asDimension(r.dimension);
  return d
    ? presentPrinted(valueSI, d, system).text
    : formatSI(valueSI, r.dimension, system, r.unit);
}

/** What happened to a check between the two revisions, if anything worth marking. */
function checkChange(c: ComparedCheck): string | null {
  if (!c.from && c.to) return 'new';
  if (c.from && !c.to) return 'no longer checked';
  return c.from && c.to && c.from.pass !== c.to.pass ? 'verdict changed' : null;
}

/**
 * The change in the result's own unit, and in percent where a percent means something (not for
 * an absolute temperature, whose zero is arbitrary).
 */
function changeText(r: MovedResult, system: UnitSystem): string {
  if (r.from === null || r.to === null) return '—';
  const abs = formatChange(r.from, r.to, r.dimension, system, r.unit);
  if (r.deltaPct === null || r.dimension === 'temperature') return abs;
  const sign = r.deltaPct > 0 ? '+' : r.deltaPct < 0 ? '−' : '';
  return `${abs} (${sign}${formatNumber(Math.abs(r.deltaPct), 3)} %)`;
}

function verdict(pass: boolean | undefined) {
  if (pass === undefined)
    return (
      <Text span c="dimmed">
        —
      </Text>
    );
  return (
    <Badge size="xs" color={pass ? 'pass' : 'fail'} variant={pass ? 'light' : 'filled'}>
      {pass ? 'Pass' : 'Fail'}
    </Badge>
  );
}

/** A stored input as the form shows it: a choice by its label, a quantity with its unit's label. */
function showInput(field: FieldDefinition | undefined, v: unknown): string {
  if (field?.kind === 'choice' && typeof v === 'string') {
    return field.choices?.find((c) => c.value === v)?.label ?? v;
  }
  if (field?.dimension && isQuantity(v as never)) {
    const q = v as { value: number; unit: string };
    return `${String(q.value)} ${unitLabel(field.dimension, q.unit)}`;
  }
  return show(v);
}

/** What changed between two revisions: inputs, results that moved, and checks whose verdict or use changed. */
export function CompareView({
  data,
  fields = [],
}: {
  data: Compare;
  /** The sheet type's fields: the changed inputs read as the form shows them, in its order. */
  fields?: readonly FieldDefinition[];
}) {
  const system = useCurrentUser().unitSystem;
  const byKey = new Map(fields.map((f, k) => [f.key, { field: f, order: k }] as const));
  const inputs = [...data.inputs].sort(
    (a, b) =>
      (byKey.get(a.key)?.order ?? Number.MAX_SAFE_INTEGER) -
      (byKey.get(b.key)?.order ?? Number.MAX_SAFE_INTEGER),
  );
  const from = data.from.label;
  const to = data.to.label;
  return (
    <>
      <Paper p="md" component="section" aria-labelledby="cmp-inputs">
        <Title order={2} size="h5" id="cmp-inputs" mb="sm">
          Inputs changed ({data.inputs.length})
        </Title>
        {data.inputs.length === 0 ? (
          <Text size="sm" c="dimmed">
            No input changed.
          </Text>
        ) : (
          <Table fz="sm" aria-label="Inputs changed">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Input</Table.Th>
                <Table.Th>Rev. {from}</Table.Th>
                <Table.Th w={24} />
                <Table.Th>Rev. {to}</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {inputs.map((i) => (
                <Table.Tr key={i.key} data-changed-input={i.key}>
                  <Table.Td>{i.label}</Table.Td>
                  <Table.Td ff="monospace" c="dimmed" td="line-through">
                    {showInput(byKey.get(i.key)?.field, i.from)}
                  </Table.Td>
                  <Table.Td>
                    <IconArrowRight size={14} aria-label="changed to" />
                  </Table.Td>
                  <Table.Td ff="monospace" fw={600} bg="amber.0">
                    {showInput(byKey.get(i.key)?.field, i.to)}
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        )}
      </Paper>
      <Paper p="md" component="section" aria-labelledby="cmp-checks">
        <Title order={2} size="h5" id="cmp-checks" mb="sm">
          Checks
        </Title>
        <Table fz="sm" aria-label="Checks compared">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Check</Table.Th>
              <Table.Th>Rev. {from}</Table.Th>
              <Table.Th>Rev. {to}</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {data.checks.map((c) => {
              const change = checkChange(c);
              return (
                <Table.Tr key={c.id} bg={change ? 'amber.0' : undefined} data-check-change={change}>
                  <Table.Td>
                    {c.label}
                    {change ? (
                      <Text span size="xs" fw={600} c="amber.9">
                        {' '}
                        · {change}
                      </Text>
                    ) : null}
                  </Table.Td>
                  <Table.Td>
                    <Group gap={6}>
                      {verdict(c.from?.pass)}
                      {c.from ? (
                        <Text span size="xs" ff="monospace">
                          {Math.round(c.from.utilisation * 100)} %
                        </Text>
                      ) : null}
                    </Group>
                  </Table.Td>
                  <Table.Td>
                    <Group gap={6}>
                      {verdict(c.to?.pass)}
                      {c.to ? (
                        <Text span size="xs" ff="monospace">
                          {Math.round(c.to.utilisation * 100)} %
                        </Text>
                      ) : null}
                    </Group>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Paper>
      <Paper p="md" component="section" aria-labelledby="cmp-results" data-testid="results-moved">
        <Title order={2} size="h5" id="cmp-results" mb="sm">
          Results moved ({data.results.length})
        </Title>
        {data.results.length === 0 ? (
          <Text size="sm" c="dimmed">
            No result moved.
          </Text>
        ) : (
          <Table fz="sm" aria-label="Results moved">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Result</Table.Th>
                <Table.Th ta="right">Rev. {from}</Table.Th>
                <Table.Th ta="right">Rev. {to}</Table.Th>
                <Table.Th ta="right">Change</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {data.results.map((r) => (
                <Table.Tr key={r.key}>
                  <Table.Td>{r.label}</Table.Td>
                  <Table.Td ff="monospace" ta="right" style={{ whiteSpace: 'nowrap' }}>
                    {r.from === null ? '—' : resultText(r.from, r, system)}
                  </Table.Td>
                  <Table.Td ff="monospace" ta="right" style={{ whiteSpace: 'nowrap' }} fw={600}>
                    {r.to === null ? '—' : resultText(r.to, r, system)}
                  </Table.Td>
                  <Table.Td
                    ff="monospace"
                    ta="right"
                    style={{ whiteSpace: 'nowrap' }}
                    fw={r.deltaPct !== null && Math.abs(r.deltaPct) >= 1 ? 700 : 400}
                    bg={r.deltaPct !== null && Math.abs(r.deltaPct) >= 1 ? 'amber.0' : undefined}
                  >
                    {changeText(r, system)}
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        )}
      </Paper>
    </>
  );
}
