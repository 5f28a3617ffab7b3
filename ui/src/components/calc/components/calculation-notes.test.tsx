import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import { renderWithProviders } from '../../../testing/render';
import { CalculationNotes } from './calculation-notes';

const notes = Array.from({ length: 5 }, (_, k) => `Note ${k + 1} on the inputs, in full.`);

describe('calculation notes', () => {
  it('shows the first notes whole while collapsed, and the rest behind a toggle below them', async () => {
    const { user } = renderWithProviders(<CalculationNotes warnings={notes} />);
    expect(screen.getAllByRole('listitem').map((li) => li.textContent)).toEqual(notes.slice(0, 2));
    const toggle = screen.getByRole('button', { name: 'Show all 5 notes' });
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    await user.click(toggle);
    expect(screen.getAllByRole('listitem').map((li) => li.textContent)).toEqual(notes);
    await user.click(screen.getByRole('button', { name: 'Show fewer' }));
    expect(screen.getAllByRole('listitem')).toHaveLength(2);
  });

  it('offers no toggle when every note is already shown', () => {
    renderWithProviders(<CalculationNotes warnings={notes.slice(0, 2)} />);
    expect(screen.getAllByRole('listitem')).toHaveLength(2);
    expect(screen.queryByRole('button')).toBeNull();
  });
});
