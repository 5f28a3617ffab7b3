import { memo, type ReactNode } from 'react';
import { Group, Paper, Stack, Text } from '@mantine/core';
import type { CheckDriver, CheckResult, Dimension } from '@holdfast/calc';
import { CheckDriversButton } from './check-drivers-button';
import { Verdict } from './verdict';
import { UtilisationBar } from './utilisation-bar';
import { presentSI, type UnitSystem } from '../utils/units';

export interface CheckListProps {
  checks: CheckResult[];
  unitSystem: UnitSystem;
  renderCheckAside?: (id: string) => ReactNode;
  /** The inputs that drive a check (offered on failing checks). */
  findDrivers?: (checkId: string) => CheckDriver[];
}

/** Every check: its value against the limit, the utilisation, the verdict and the limit's source. */
export function CheckList({ checks, unitSystem, renderCheckAside, findDrivers }: CheckListProps) {
  if (checks.length === 0) return <Text c="dimmed">This sheet has no checks.</Text>;
  return (
    <Stack gap="xs" component="ul" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Checks">
      {checks.map((check) => (
        <CheckRow
          key={check.id}
          check={check}
          unitSystem={unitSystem}
          renderAside={renderCheckAside}
          findDrivers={findDrivers}
        />
      ))}
    </Stack>
  );
}

interface CheckRowProps {
  check: CheckResult;
  unitSystem: UnitSystem;
  renderAside?: (id: string) => ReactNode;
  findDrivers?: (checkId: string) => CheckDriver[];
}

const CheckRow = memo(function CheckRow({
  check,
  unitSystem,
  renderAside,
  findDrivers,
}: CheckRowProps) {
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
        <Group gap={6} wrap="nowrap" style={{ flexShrink: 0 }}>
          {findDrivers && !check.pass ? (
            <CheckDriversButton label={check.label} find={() => findDrivers(check.id)} />
          ) : null}
          {renderAside?.(check.id)}
          <Verdict pass={check.pass} />
        </Group>
      </Group>
      <UtilisationBar utilisation={check.utilisation} pass={check.pass} />
      <Text size="xs" c="dimmed" mt={4}>
        {check.message ? `${check.message} · ` : ''}Limit: {check.source}
      </Text>
    </Paper>
  );
}, sameRow);

/** A row renders again only when what it shows changed (each evaluation makes new objects). */
function sameRow(a: CheckRowProps, b: CheckRowProps): boolean {
  const x = a.check;
  const y = b.check;
  return (
    a.unitSystem === b.unitSystem &&
    a.findDrivers === b.findDrivers &&
    a.renderAside === b.renderAside &&
    x.id === y.id &&
    x.value === y.value &&
    x.limit === y.limit &&
    x.utilisation === y.utilisation &&
    x.pass === y.pass &&
    x.label === y.label &&
    x.message === y.message &&
    x.source === y.source
  );
}
