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
