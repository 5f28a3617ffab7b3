import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import type { CheckResult } from '@holdfast/calc';
import { renderWithProviders } from '../../../testing/render';
import { CheckList } from './check-list';

const base: CheckResult = {
  id: 'torque',
  section: 'brake',
  label: 'Brake torque at minimum friction',
  value: 1200,
  limit: 1500,
  unit: 'N m',
  dimension: 'torque',
  kind: 'min',
  utilisation: 1.25,
  pass: false,
  source: 'Demo set v1 — common practice',
  message: '',
};

describe('CheckList', () => {
  it('says pass or fail in words, with value, limit and utilisation', () => {
    renderWithProviders(
      <CheckList
        unitSystem="SI"
        checks={[
          base,
          {
            ...base,
            id: 'pressure',
            label: 'Lining pressure',
            kind: 'max',
            value: 0.5e6,
            limit: 1e6,
            unit: 'Pa',
            dimension: 'pressure',
            utilisation: 0.5,
            pass: true,
          },
        ]}
      />,
    );
    const torque = screen.getByRole('listitem', { name: /Brake torque at minimum friction: fail/ });
    expect(within(torque).getByText('Fail')).toBeInTheDocument();
    expect(torque).toHaveTextContent('1200 N·m');
    expect(torque).toHaveTextContent('≥ 1500 N·m required');
    expect(within(torque).getByRole('meter', { name: 'Utilisation' })).toHaveAttribute(
      'aria-valuetext',
      '125 % of the limit',
    );
    expect(torque).toHaveTextContent('Limit: Demo set v1 — common practice');
    const pressure = screen.getByRole('listitem', { name: /Lining pressure: pass/ });
    expect(within(pressure).getByText('Pass')).toBeInTheDocument();
    // As the printed sheet shows them: pressures to 3 significant figures.
    expect(pressure).toHaveTextContent('0.500 MPa');
    expect(pressure).toHaveTextContent('≤ 1.00 MPa allowed');
  });

  it('shows values in US customary units when asked', () => {
    renderWithProviders(
      <CheckList unitSystem="US" checks={[{ ...base, value: 1355.82, limit: 1355.82 * 1.25 }]} />,
    );
    expect(screen.getByRole('listitem')).toHaveTextContent('1000 lbf·ft');
  });

  it('shows a count as a count, and more figures where value and limit would read alike', () => {
    renderWithProviders(
      <CheckList
        unitSystem="SI"
        checks={[
          {
            ...base,
            id: 'brakes',
            label: 'Holding brakes installed',
            value: 2,
            limit: 2,
            unit: '',
            dimension: 'dimensionless',
            utilisation: 1,
            pass: true,
          },
          {
            ...base,
            id: 'pv',
            label: 'p·v when the brake sets',
            kind: 'max',
            value: 2.098e6,
            limit: 2.1e6,
            unit: 'Pa m/s',
            dimension: 'pv',
            utilisation: 0.999,
            pass: true,
          },
        ]}
      />,
    );
    const brakes = screen.getByRole('listitem', { name: /Holding brakes installed/ });
    expect(brakes).toHaveTextContent('2 ≥ 2 required');
    const pv = screen.getByRole('listitem', { name: /p·v when the brake sets/ });
    expect(pv).toHaveTextContent('2.09800 MPa·m/s ≤ 2.10000 MPa·m/s allowed');
  });
});
