import { describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { CheckDriver } from '@holdfast/calc';
import { renderWithProviders } from '../../../testing/render';
import { CheckDriversButton } from './check-drivers-button';

const drivers: CheckDriver[] = [
  { key: 'springForce', label: 'Main spring force as set', effect: -0.8 },
  { key: 'leverRatio', label: 'Lever ratio', effect: -0.5 },
];

describe('CheckDriversButton', () => {
  it('ranks nothing and mounts no popover until asked; then lists the drivers with the focus in the list', async () => {
    const find = vi.fn(() => drivers);
    renderWithProviders(
      <CheckDriversButton label="Holding torque" checkId="holding" find={find} />,
    );
    const button = screen.getByRole('button', { name: 'Inputs that drive Holding torque' });
    expect(find).not.toHaveBeenCalled();
    expect(button).toHaveAttribute('aria-expanded', 'false');
    expect(screen.queryByText(/Inputs that move this check most/)).toBeNull();

    await userEvent.click(button);
    expect(find).toHaveBeenCalledWith('holding');
    expect(await screen.findByText('Main spring force as set')).toBeInTheDocument();
    expect(screen.getByText('Lever ratio')).toBeInTheDocument();
    await waitFor(() => expect(document.activeElement?.closest('[data-driver]')).not.toBeNull());
    expect(
      screen.getByRole('button', { name: 'Inputs that drive Holding torque' }),
    ).toHaveAttribute('aria-expanded', 'true');

    await userEvent.keyboard('{Escape}');
    await waitFor(() => expect(screen.queryByText('Lever ratio')).toBeNull());
  });
});
