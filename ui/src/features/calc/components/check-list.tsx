import type { ReactNode } from 'react';
import { Group, Paper, Stack, Text } from '@mantine/core';
import type { CheckResult, Dimension } from '@holdfast/calc';
import { Verdict } from './verdict';
import { UtilisationBar } from './utilisation-bar';
import { presentSI, type UnitSystem } from '../utils/units';

export interface CheckListProps {
  checks: CheckResult[];
  unitSystem: UnitSystem;
  renderCheckAside?: (id: string) => ReactNode;
}

/** Every check: its value against the limit, the utilisation, the verdict and the limit's source. */
export function CheckList({ checks, unitSystem, renderCheckAside }: CheckListProps) {
  if (checks.length === 0) return <Text c="dimmed">This sheet has no checks.</Text>;
  return (
    <Stack gap="xs" component="ul" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Checks">
      {checks.map((check) => (
        <CheckRow
          key={check.id}
          check={check}
          unitSystem={unitSystem}
          aside={renderCheckAside?.(check.id)}
        />
      ))}
    </Stack>
  );
}

function CheckRow({
  check,
  unitSystem,
  aside,
}: {
  check: CheckResult;
  unitSystem: UnitSystem;
  aside?: ReactNode;
}) {
  const dim = check.dimension as Dimension;
  const value = presentSI(check.value, dim, unitSystem);
  const limit = presentSI(check.limit, dim, unitSystem);
  const relation = check.kind === 'max' ? '≤' : '≥';
  return (
    <Paper
      component="li"
      p="sm"
      data-check={check.id}
      data-pass={check.pass}
      aria-label={`${check.label}: ${check.pass ? 'pass' : 'fail'}`}
    >
      <Group justify="space-between" wrap="nowrap" align="flex-start" gap="sm">
        <Stack gap={2} style={{ minWidth: 0 }}>
          <Text fw={600} size="sm">
            {check.label}
          </Text>
          <Text size="sm" ff="monospace">
            {value.text}{' '}
            <Text span c="dimmed" ff="monospace">
              {relation} {limit.text} {check.kind === 'max' ? 'allowed' : 'required'}
            </Text>
          </Text>
        </Stack>
        <Group gap={6} wrap="nowrap">
          {aside}
          <Verdict pass={check.pass} />
        </Group>
      </Group>
      <UtilisationBar utilisation={check.utilisation} pass={check.pass} />
      <Text size="xs" c="dimmed" mt={4}>
        {check.message ? `${check.message} · ` : ''}Limit: {check.source}
      </Text>
    </Paper>
  );
}
