import { describe, expect, it } from 'vitest';
import { formatChange, formatSI } from './format-si';

describe('formatSI', () => {
  it('prints absolute temperatures in °C and their changes in K, never in percent', () => {
    expect(formatSI(413.6, 'temperature', 'SI')).toBe('140.5 °C');
    expect(formatChange(413.6, 468.8, 'temperature', 'SI')).toBe('+55.2 K');
  });

  it('prints limits in the trade’s units with their unit', () => {
    expect(formatSI(2.1e6, 'pv', 'SI')).toBe('2.100 MPa·m/s');
    expect(formatSI(0.2716, 'length', 'SI')).toMatch(/^271\.6 mm$/);
    expect(formatSI(60 / 3600, 'frequency', 'SI')).toBe('60.00 stops/h');
  });

  it('falls back to the SI unit text when the dimension is unknown', () => {
    expect(formatSI(1.5, undefined, 'SI', 'N m')).toBe('1.500 N m');
    expect(formatSI(0.25, 'dimensionless', 'SI')).toBe('0.2500');
  });
});
