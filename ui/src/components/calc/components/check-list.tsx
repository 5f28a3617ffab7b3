import { memo, type ReactNode } from 'react';
import { Stack, Text } from '@mantine/core';
import { checkFigures, type CheckDriver, type CheckResult, type Dimension } from '@holdfast/calc';
import { Aside } from './aside';
import { CheckDriversButton } from './check-drivers-button';
import { Verdict } from './verdict';
import { UtilisationBar } from './utilisation-bar';
import type { UnitSystem } from '../utils/units';
import classes from './check-list.module.css';

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
  // The figures the printed sheet shows for this check, so screen and paper agree.
  const figures = checkFigures(
    {
      value: check.value,
      limit: check.limit,
      dimension: check.dimension as Dimension,
      label: check.label,
    },
    unitSystem,
  );
  const relation = check.kind === 'max' ? '≤' : '≥';
  return (
    <li
      className={classes.row}
      data-check={check.id}
      data-pass={check.pass}
      aria-label={`${check.label}: ${check.pass ? 'pass' : 'fail'}`}
    >
      <div className={classes.head}>
        <div className={classes.text}>
          <p className={classes.label}>{check.label}</p>
          <p className={classes.figures}>
            {figures.value}{' '}
            <span className={classes.dimmed}>
              {relation} {figures.limit} {check.kind === 'max' ? 'allowed' : 'required'}
            </span>
          </p>
        </div>
        <div className={classes.aside}>
          {findDrivers && !check.pass ? (
            <CheckDriversButton label={check.label} checkId={check.id} find={findDrivers} />
          ) : null}
          {renderAside ? <Aside id={check.id} render={renderAside} /> : null}
          <Verdict pass={check.pass} />
        </div>
      </div>
      <UtilisationBar utilisation={check.utilisation} pass={check.pass} />
      <p className={classes.source}>
        {check.message ? `${check.message} · ` : ''}Limit: {check.source}
      </p>
    </li>
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
