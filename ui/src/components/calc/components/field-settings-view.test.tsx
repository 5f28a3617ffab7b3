import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import { settingPrecision, toDisplay } from '@holdfast/calc';
import { makeEvaluation } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { FieldSettingsView } from './field-settings-view';

const spring = {
  key: 'springLength',
  label: 'Main spring length as set',
  value: 0.2227,
  unit: 'm',
  dimension: 'length' as const,
};

/** What the printed card prints: calc's toDisplay with the setting's precision. */
function printed(value: number, key: string, system: 'SI' | 'US'): string {
  return toDisplay(value, 'length', system, undefined, settingPrecision(key, 'length')).text;
}

describe('FieldSettingsView', () => {
  it('shows a spring length of 0.2227 m as the card prints it: 222.5 mm, to the 0.5 mm rule step', () => {
    renderWithProviders(
      <FieldSettingsView
        evaluation={makeEvaluation({ fieldSettings: [spring] })}
        unitSystem="SI"
      />,
    );
    const row = screen.getByRole('row', { name: /Main spring length as set/ });
    expect(row).toHaveTextContent('222.5 mm');
    // Rounded by dimension alone it would read 222.7 mm, which the card never prints.
    expect(row).not.toHaveTextContent('222.7');
    expect(printed(0.2227, 'springLength', 'SI')).toBe('222.5 mm');
  });

  it('rounds a shoe clearance to the 0.05 mm feeler step, and US units as the card does', () => {
    const clearance = {
      key: 'shoeClearance',
      label: 'Shoe clearance each side',
      value: 0.00083,
      unit: 'm',
      dimension: 'length' as const,
    };
    const { unmount } = renderWithProviders(
      <FieldSettingsView
        evaluation={makeEvaluation({ fieldSettings: [spring, clearance] })}
        unitSystem="SI"
      />,
    );
    expect(screen.getByRole('row', { name: /Shoe clearance each side/ })).toHaveTextContent(
      '0.85 mm',
    );
    unmount();
    renderWithProviders(
      <FieldSettingsView
        evaluation={makeEvaluation({ fieldSettings: [spring] })}
        unitSystem="US"
      />,
    );
    expect(screen.getByRole('row', { name: /Main spring length as set/ })).toHaveTextContent(
      printed(0.2227, 'springLength', 'US'),
    );
  });

  it('prints setting-table cells to the same steps as the printed table', () => {
    renderWithProviders(
      <FieldSettingsView
        evaluation={makeEvaluation({
          tables: [
            {
              id: 'spring-table',
              title: 'Spring setting table',
              columns: [
                { key: 'springLength', label: 'Spring length', unit: 'm', dimension: 'length' },
              ],
              rows: [{ springLength: 0.2227 }, { springLength: 0.21862 }],
            },
          ],
        })}
        unitSystem="SI"
      />,
    );
    const table = screen.getByRole('table', { name: 'Spring setting table' });
    expect(within(table).getByRole('columnheader')).toHaveTextContent('Spring length (mm)');
    const cells = within(table).getAllByRole('cell');
    expect(cells.map((c) => c.textContent)).toEqual(['222.5', '218.5']);
  });

  it('says where every check passes and marks each row that fails one', () => {
    const table = {
      id: 'spring-setting',
      title: 'Spring setting table (new lining)',
      columns: [
        { key: 'springForce', label: 'Spring force', unit: 'N', dimension: 'force' as const },
      ],
      rows: [{ springForce: 1000 }, { springForce: 1150 }, { springForce: 1300 }],
    };
    const band = {
      tableId: 'spring-setting',
      set: 1150,
      failing: [
        ['Stopping distance at the load ≤ allowed'],
        [],
        ['p·v when the brake sets ≤ limit'],
      ],
      low: 1113.7,
      high: 1176.4,
      lowLimitedBy: ['Stopping distance at the load ≤ allowed'],
      highLimitedBy: ['p·v when the brake sets ≤ limit'],
    };
    renderWithProviders(
      <FieldSettingsView
        evaluation={makeEvaluation({ tables: [table] })}
        bands={[band]}
        unitSystem="SI"
      />,
    );
    expect(screen.getByTestId('setting-band')).toHaveTextContent(
      'Every check of this sheet passes with the spring force from 1120 N to 1170 N',
    );
    const grid = screen.getByRole('table', { name: table.title });
    expect(
      within(grid).getByRole('columnheader', { name: 'Other checks at this setting' }),
    ).toBeTruthy();
    const rows = within(grid).getAllByRole('row').slice(1);
    // The band's ends (as the sentence prints them) and the set value are rows of their own.
    expect(
      rows.map((r) => [r.firstElementChild?.textContent, r.lastElementChild?.textContent]),
    ).toEqual([
      ['1000', 'fails: Stopping distance at the load ≤ allowed'],
      ['1120', 'every check passes (low end of the band)'],
      ['1150', 'every check passes (as set)'],
      ['1170', 'every check passes (high end of the band)'],
      ['1300', 'fails: p·v when the brake sets ≤ limit'],
    ]);
  });

  it('shows no verdict column for a record stored before bands were kept', () => {
    renderWithProviders(
      <FieldSettingsView
        evaluation={makeEvaluation({
          tables: [
            {
              id: 'spring-setting',
              title: 'Old table',
              columns: [
                { key: 'springForce', label: 'Spring force', unit: 'N', dimension: 'force' },
              ],
              rows: [{ springForce: 1000 }],
            },
          ],
        })}
        unitSystem="SI"
      />,
    );
    expect(screen.queryByTestId('setting-band')).toBeNull();
    expect(screen.queryByRole('columnheader', { name: 'Other checks at this setting' })).toBeNull();
  });

  it('says when a setting’s tolerance reaches settings where a check fails, and what holds it', () => {
    const table = {
      id: 'spring-setting',
      title: 'Spring setting table (new lining)',
      columns: [
        { key: 'springForce', label: 'Spring force', unit: 'N', dimension: 'force' as const },
      ],
      rows: [{ springForce: 1000 }, { springForce: 1300 }],
    };
    const band = {
      tableId: 'spring-setting',
      set: 1150,
      failing: [['Stopping distance at the load ≤ allowed'], ['p·v when the brake sets ≤ limit']],
      low: 1113.7,
      high: 1176.4,
      lowLimitedBy: ['Stopping distance at the load ≤ allowed'],
      highLimitedBy: ['p·v when the brake sets ≤ limit'],
    };
    const force = {
      key: 'springForce',
      label: 'Main spring force as set',
      value: 1150,
      unit: 'N',
      dimension: 'force' as const,
      tolerance: {
        band: { kind: 'relative' as const, minus: 0.05, plus: 0.05 },
        source: 'common practice',
        confidence: 'common practice' as const,
      },
    };
    renderWithProviders(
      <FieldSettingsView
        evaluation={makeEvaluation({ tables: [table], fieldSettings: [force] })}
        bands={[band]}
        unitSystem="SI"
      />,
    );
    expect(screen.getByTestId('tolerance-narrowed')).toHaveTextContent(
      'Tolerance narrowed: Main spring force as set ± 5 % would span 1090 N … 1210 N, past the band',
    );
    expect(screen.getByTestId('tolerance-narrowed')).toHaveTextContent(
      'the field card and the records hold it to −30 N / +20 N (1120 N … 1170 N)',
    );
  });
});
