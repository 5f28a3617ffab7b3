import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import { renderWithProviders } from '../testing/render';
import { formatNumber, Num } from './num';
import { SafetyCaution } from './safety-caution';

describe('formatNumber', () => {
  it('groups thousands, uses a real minus and honours fixed decimals', () => {
    expect(formatNumber(12345.678, { digits: 1 })).toBe('12,345.7');
    expect(formatNumber(-0.5, { digits: 2 })).toBe('−0.50');
    expect(formatNumber(0.123456)).toBe('0.1235');
    expect(formatNumber(3, { signed: true })).toBe('+3');
    expect(formatNumber(Number.NaN)).toBe('—');
  });
});

describe('Num and SafetyCaution', () => {
  it('prints the value with its unit', () => {
    renderWithProviders(<Num value={1500} unit="N·m" digits={0} data-testid="n" />);
    expect(screen.getByTestId('n').textContent).toBe('1,500\u2009N·m');
  });

  it('states the caution in words, not only in colour', () => {
    renderWithProviders(<SafetyCaution />);
    const note = screen.getByRole('note', { name: 'Safety caution' });
    expect(note).toHaveTextContent(/competent engineer/);
    expect(note).toHaveTextContent(/Never work under a suspended load/);
    expect(note).toHaveTextContent(/local codes and licensed practice decide/);
  });
});
