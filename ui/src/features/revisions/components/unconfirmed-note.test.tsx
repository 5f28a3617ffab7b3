import { describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import { renderWithProviders } from '../../../testing/render';
import { UnconfirmedNote } from './unconfirmed-note';

const fields = [
  { key: 'load', label: 'Rated load' },
  { key: 'springForce', label: 'Main spring force as set (new lining)' },
];

describe('confirming every example value at once', () => {
  it('lists the values and confirms only after the engineer says each was compared', async () => {
    const onConfirmAll = vi.fn();
    const { user } = renderWithProviders(
      <UnconfirmedNote fields={fields} onConfirmAll={onConfirmAll} />,
    );
    await user.click(
      screen.getByRole('button', { name: 'I have checked all 2 against this brake' }),
    );
    const dialog = await screen.findByRole('dialog', { name: 'Confirm 2 values' });
    expect(screen.getByTestId('unconfirmed-list')).toHaveTextContent('Rated load');
    const confirm = screen.getByRole('button', { name: 'Confirm all 2' });
    expect(confirm).toBeDisabled();
    expect(onConfirmAll).not.toHaveBeenCalled();
    await user.click(screen.getByRole('checkbox', { name: /compared all 2 with this brake/ }));
    await user.click(confirm);
    expect(onConfirmAll).toHaveBeenCalledWith(['load', 'springForce']);
    expect(dialog).not.toBeInTheDocument();
  });

  it('Cancel confirms nothing', async () => {
    const onConfirmAll = vi.fn();
    const { user } = renderWithProviders(
      <UnconfirmedNote fields={fields} onConfirmAll={onConfirmAll} />,
    );
    await user.click(screen.getByRole('button', { name: /I have checked all/ }));
    await user.click(await screen.findByRole('button', { name: 'Cancel' }));
    expect(onConfirmAll).not.toHaveBeenCalled();
  });
});
