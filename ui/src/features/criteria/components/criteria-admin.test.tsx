import { describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import type { CriterionValueInput } from '@holdfast/shared';
import { jsonError, mockFetch, type MockRequest } from '../../../testing/mock-fetch';
import { renderWithProviders } from '../../../testing/render';
import { CreateCriteriaSetDialog } from './create-criteria-set-dialog';
import { CriteriaValuesTable } from './criteria-values-table';

const pv: CriterionValueInput = {
  key: 'pvLimit',
  label: 'Lining pressure × rubbing speed limit',
  value: 2.1e6,
  unit: 'Pa m/s',
  source: 'from memory — check the lining maker’s data',
  confidence: 'memory',
};

describe('criteria values on screen', () => {
  it('shows "From memory" until a document confirms the value, then the document instead', () => {
    const first = renderWithProviders(<CriteriaValuesTable values={[pv]} />);
    expect(screen.getByText('From memory')).toBeInTheDocument();
    first.unmount();
    renderWithProviders(
      <CriteriaValuesTable
        values={[pv]}
        confirmations={[
          {
            key: 'pvLimit',
            version: 1,
            document: 'Lining data sheet LX-2 rev. 4',
            clause: 'Table 3',
            confirmedAt: '2026-12-02T10:00:00.000Z',
            confirmedBy: {
              id: '44444444-4444-4444-8444-444444444444',
              displayName: 'Kim Lund',
              initials: 'KL',
            },
          },
        ]}
      />,
    );
    expect(screen.queryByText('From memory')).toBeNull();
    expect(screen.getByText('Confirmed')).toBeInTheDocument();
    expect(screen.getByText(/Lining data sheet LX-2 rev. 4, Table 3 — KL/)).toBeInTheDocument();
  });
});

describe('CreateCriteriaSetDialog', () => {
  it('sends the set typed key by key and puts each server error beside its field', async () => {
    const onCreated = vi.fn();
    const mock = mockFetch({
      'POST /api/criteria-sets': (req: MockRequest) => {
        const body = req.body as { values: CriterionValueInput[] };
        if (body.values[0]!.value <= 0)
          return jsonError(400, 'validation_failed', 'Some fields are not valid.', [
            { path: 'values.0.value', message: 'must be above 0 and at most 50000000 Pa m/s' },
          ]);
        return jsonError(409, 'conflict', 'A criteria set with the id "plant-ps7" exists already.');
      },
    });
    const { user } = renderWithProviders(
      <CreateCriteriaSetDialog
        opened
        onClose={() => undefined}
        startFrom={[pv]}
        startName="Crane hoist"
        onCreated={onCreated}
      />,
    );
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByRole('textbox', { name: /^Id/ }), 'plant-ps7');
    await user.type(within(dialog).getByRole('textbox', { name: /^Name/ }), 'Plant standard PS-7');
    await user.type(
      within(dialog).getByRole('textbox', { name: /which standard governs/ }),
      'Plant limits; standard governs.',
    );
    const value = within(dialog).getByRole('textbox', { name: `${pv.label} value` });
    await user.clear(value);
    await user.type(value, '-5');
    await user.type(
      within(dialog).getByRole('textbox', { name: /Where the values come from/ }),
      'Plant standard PS-7.',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Create the set' }));
    expect(await within(dialog).findByText(/must be above 0/)).toBeInTheDocument();
    expect(mock.callsTo('POST /api/criteria-sets')[0]!.body).toMatchObject({
      id: 'plant-ps7',
      values: [{ key: 'pvLimit', value: -5 }],
    });
    await user.clear(value);
    await user.type(value, '1800000');
    await user.click(within(dialog).getByRole('button', { name: 'Create the set' }));
    expect(await within(dialog).findByText(/exists already/)).toBeInTheDocument();
    expect(onCreated).not.toHaveBeenCalled();
    // Typed key by key on a shared, loaded machine.
  }, 90_000);
});
