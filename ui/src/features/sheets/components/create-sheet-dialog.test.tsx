import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import { makeRegister, registerPositionId, testUsers } from '../../../testing/fixtures';
import { mockFetch } from '../../../testing/mock-fetch';
import { renderWithProviders } from '../../../testing/render';
import { CreateSheetDialog } from './create-sheet-dialog';

const positions = [
  {
    group: 'NRW › LC-1',
    items: [{ value: registerPositionId, label: 'MH-B1 — Main hoist brake' }],
  },
];

describe('new sheet dialog: the title', () => {
  it('says a title is required when none is typed, and how long one must be when it is short', async () => {
    mockFetch({
      'GET /api/register': { body: makeRegister([]) },
      'GET /api/sheets': { body: { items: [], total: 0, page: 1, pageSize: 25 } },
    });
    const { user } = renderWithProviders(
      <CreateSheetDialog
        opened
        onClose={() => {}}
        positions={positions}
        initialPositionId={registerPositionId}
        onCreated={() => {}}
      />,
      { user: testUsers.engineer },
    );
    const dialog = await screen.findByRole('dialog', { name: 'New calculation sheet' });
    const create = within(dialog).getByRole('button', { name: 'Create sheet' });
    await user.click(create);
    expect(await within(dialog).findByText('Required: enter a title')).toBeVisible();
    await user.type(within(dialog).getByRole('textbox', { name: /^Title/ }), 'ab');
    await user.click(create);
    expect(await within(dialog).findByText('At least 3 characters')).toBeVisible();
    expect(within(dialog).queryByText(/^at least/)).toBeNull();
  });
});
