import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import { getSheetType } from '@holdfast/calc';
import type { Compare } from '@holdfast/shared';
import { testUsers } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { CompareView } from './compare-view';

const hoist = getSheetType('hoist-shoe-brake')!;

/** Two revisions that differ in a choice, a quantity in stops per hour and the load (in that key order). */
const data = {
  from: { label: 'A' },
  to: { label: 'B' },
  inputs: [
    { key: 'torqueModel', label: 'Torque model', from: 'pivoted', to: 'short' },
    {
      key: 'emergencyStopsPerHour',
      label: 'Emergency stops per hour',
      from: { value: 2, unit: '1/h' },
      to: { value: 4, unit: '1/h' },
    },
    {
      key: 'load',
      label: 'Rated load',
      from: { value: 9000, unit: 'kg' },
      to: { value: 10, unit: 't' },
    },
  ],
  results: [],
  checks: [],
} as unknown as Compare;

describe('comparing two revisions', () => {
  it('shows changed inputs as the form does: choice labels, unit labels, the form’s order', () => {
    renderWithProviders(<CompareView data={data} fields={hoist.fields} />, {
      user: testUsers.engineer,
    });
    const rows = within(screen.getByRole('table', { name: 'Inputs changed' }))
      .getAllByRole('row')
      .slice(1)
      .map((r) => r.getAttribute('data-changed-input'));
    const order = (k: string) => hoist.fields.findIndex((f) => f.key === k);
    expect(rows).toEqual([...rows].sort((a, b) => order(a!) - order(b!)));
    const model = screen.getByText(
      (_, el) => el?.getAttribute('data-changed-input') === 'torqueModel',
    );
    const choice = hoist.fields.find((f) => f.key === 'torqueModel')!.choices!;
    expect(model).toHaveTextContent(choice.find((c) => c.value === 'short')!.label);
    expect(model).not.toHaveTextContent(/\bshort\b$/);
    const stops = screen.getByText(
      (_, el) => el?.getAttribute('data-changed-input') === 'emergencyStopsPerHour',
    );
    expect(stops).toHaveTextContent('4 stops/h');
    expect(stops).not.toHaveTextContent('1/h');
  });
});

describe('comparing results and checks', () => {
  const state = (pass: boolean, utilisation: number) => ({ pass, utilisation });
  const moved = {
    ...data,
    inputs: [],
    results: [
      {
        key: 'brakingForce',
        label: 'Braking force',
        unit: 'N',
        dimension: 'force',
        from: 1007.4,
        to: 1107.9,
        delta: 100.5,
        deltaPct: 9.98,
      },
      {
        key: 'pressure',
        label: 'Lining pressure',
        unit: 'Pa',
        dimension: 'pressure',
        from: 84240,
        to: 92660,
        delta: 8420,
        deltaPct: 9.99,
      },
    ],
    checks: [
      { id: 'added', label: 'Added check', from: null, to: state(true, 0.5) },
      { id: 'dropped', label: 'Dropped check', from: state(true, 0.5), to: null },
      { id: 'flipped', label: 'Flipped check', from: state(true, 0.9), to: state(false, 1.1) },
      { id: 'same', label: 'Same check', from: state(true, 0.5), to: state(true, 0.6) },
    ],
  } as unknown as Compare;

  it('gives results to the printed precision, as the Results view does', () => {
    renderWithProviders(<CompareView data={moved} />, { user: testUsers.engineer });
    const table = screen.getByRole('table', { name: 'Results moved' });
    expect(within(table).getByText('1010 N')).toBeInTheDocument();
    expect(within(table).getByText('0.0842 MPa')).toBeInTheDocument();
    expect(within(table).queryByText('1007 N')).toBeNull();
  });

  it('marks a check that is new as new, not as a changed verdict', () => {
    renderWithProviders(<CompareView data={moved} />, { user: testUsers.engineer });
    const row = (label: string) => screen.getByText(label).closest('tr')!;
    expect(row('Added check')).toHaveTextContent('· new');
    expect(row('Added check')).not.toHaveTextContent('verdict changed');
    expect(row('Dropped check')).toHaveTextContent('· no longer checked');
    expect(row('Flipped check')).toHaveTextContent('· verdict changed');
    expect(row('Same check')).not.toHaveTextContent('·');
  });
});
