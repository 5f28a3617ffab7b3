import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import type { InputValue } from '@holdfast/calc';
import { renderWithProviders } from '../../../testing/render';
import { UnitField } from './unit-field';

function Harness({ initial, onValue }: { initial: InputValue; onValue: (v: InputValue) => void }) {
  const [value, setValue] = useState<InputValue>(initial);
  return (
    <UnitField
      label="Spring force"
      name="Spring force"
      dimension="force"
      value={value}
      fallbackUnit="N"
      onChange={(v) => {
        setValue(v);
        onValue(v);
      }}
    />
  );
}

describe('UnitField', () => {
  it('keeps the chosen unit when a plain number is typed', async () => {
    const onValue = vi.fn();
    const { user } = renderWithProviders(
      <Harness initial={{ value: 2000, unit: 'N' }} onValue={onValue} />,
    );
    const input = screen.getByRole('textbox', { name: 'Spring force' });
    await user.clear(input);
    await user.type(input, '2500');
    expect(onValue).toHaveBeenLastCalledWith({ value: 2500, unit: 'N' });
  });

  it('takes a unit typed after the number and moves it to the picker', () => {
    const onValue = vi.fn();
    renderWithProviders(<Harness initial={{ value: 2000, unit: 'N' }} onValue={onValue} />);
    const input = screen.getByRole('textbox', { name: 'Spring force' });
    fireEvent.change(input, { target: { value: '1.5 kN' } });
    expect(onValue).toHaveBeenLastCalledWith({ value: 1.5, unit: 'kN' });
    expect(input).toHaveValue('1.5');
    expect(screen.getByRole('combobox', { name: 'Spring force unit' })).toHaveValue('kN');
  });

  it('converts the value when another unit is picked, so the force stays the same', async () => {
    const onValue = vi.fn();
    const { user } = renderWithProviders(
      <Harness initial={{ value: 4448.22, unit: 'N' }} onValue={onValue} />,
    );
    await user.selectOptions(screen.getByRole('combobox', { name: 'Spring force unit' }), 'lbf');
    const last = onValue.mock.calls.at(-1)![0] as { value: number; unit: string };
    expect(last.unit).toBe('lbf');
    expect(Math.abs(last.value - 1000)).toBeLessThan(0.01);
    expect(
      Number((screen.getByRole('textbox', { name: 'Spring force' }) as HTMLInputElement).value),
    ).toBeCloseTo(1000, 1);
  });

  it('keeps text that is not a number so the calc core can name the problem', () => {
    const onValue = vi.fn();
    renderWithProviders(<Harness initial={{ value: 2000, unit: 'N' }} onValue={onValue} />);
    const input = screen.getByRole('textbox', { name: 'Spring force' });
    fireEvent.change(input, { target: { value: '12 parsecs' } });
    expect(onValue).toHaveBeenLastCalledWith('12 parsecs');
    expect(input).toHaveValue('12 parsecs');
  });

  it('shows a field error and offers both unit systems', () => {
    renderWithProviders(
      <UnitField
        label="Drum diameter"
        name="Drum diameter"
        dimension="length"
        value={{ value: 400, unit: 'mm' }}
        fallbackUnit="mm"
        onChange={() => undefined}
        error="must be at least 100 mm"
      />,
    );
    expect(screen.getByText('must be at least 100 mm')).toBeInTheDocument();
    const options = Array.from(
      (screen.getByRole('combobox', { name: 'Drum diameter unit' }) as HTMLSelectElement).options,
    ).map((o) => o.value);
    expect(options).toEqual(expect.arrayContaining(['mm', 'm', 'in', 'ft']));
  });
});
