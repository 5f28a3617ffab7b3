import { Badge, Group, Paper, Table, Text, Title } from '@mantine/core';
import { IconArrowRight } from '@tabler/icons-react';
import type { Compare } from '@holdfast/shared';
import { formatNumber } from '@holdfast/calc';

function show(v: unknown): string {
  if (v === null || v === undefined) return '—';
  if (typeof v === 'object' && 'value' in (v as object) && 'unit' in (v as object)) {
    const q = v as { value: unknown; unit: unknown };
    return `${String(q.value)} ${String(q.unit)}`;
  }
  return String(v);
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

/** What changed between two revisions: inputs, results that moved, and checks whose verdict or use changed. */
export function CompareView({ data }: { data: Compare }) {
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
              {data.inputs.map((i) => (
                <Table.Tr key={i.key} data-changed-input={i.key}>
                  <Table.Td>{i.label}</Table.Td>
                  <Table.Td ff="monospace" c="dimmed" td="line-through">
                    {show(i.from)}
                  </Table.Td>
                  <Table.Td>
                    <IconArrowRight size={14} aria-label="changed to" />
                  </Table.Td>
                  <Table.Td ff="monospace" fw={600} bg="amber.0">
                    {show(i.to)}
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
              const flipped = c.from?.pass !== c.to?.pass;
              return (
                <Table.Tr key={c.id} bg={flipped ? 'amber.0' : undefined}>
                  <Table.Td>
                    {c.label}
                    {flipped ? (
                      <Text span size="xs" fw={600} c="amber.9">
                        {' '}
                        · verdict changed
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
      <Paper p="md" component="section" aria-labelledby="cmp-results">
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
                <Table.Th>Unit (SI)</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {data.results.map((r) => (
                <Table.Tr key={r.key}>
                  <Table.Td>{r.label}</Table.Td>
                  <Table.Td ff="monospace" ta="right">
                    {r.from === null ? '—' : formatNumber(r.from, 4)}
                  </Table.Td>
                  <Table.Td ff="monospace" ta="right" fw={600}>
                    {r.to === null ? '—' : formatNumber(r.to, 4)}
                  </Table.Td>
                  <Table.Td
                    ff="monospace"
                    ta="right"
                    fw={r.deltaPct !== null && Math.abs(r.deltaPct) >= 1 ? 700 : 400}
                    bg={r.deltaPct !== null && Math.abs(r.deltaPct) >= 1 ? 'amber.0' : undefined}
                  >
                    {r.deltaPct === null
                      ? '—'
                      : `${r.deltaPct > 0 ? '+' : r.deltaPct < 0 ? '−' : ''}${formatNumber(Math.abs(r.deltaPct), 3)} %`}
                  </Table.Td>
                  <Table.Td c="dimmed">{r.unit}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        )}
      </Paper>
    </>
  );
}
