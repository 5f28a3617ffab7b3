import { describe, expect, it } from 'vitest';
import type { ChartData } from '@holdfast/calc';
import { toDisplayChart } from './chart-data';

const chart: ChartData = {
  id: 'torque-wear',
  title: 'Torque against lining wear',
  xLabel: 'Lining wear',
  xUnit: 'm',
  xDimension: 'length',
  yLabel: 'Brake torque',
  yUnit: 'N m',
  yDimension: 'torque',
  series: [
    {
      name: 'μ min',
      points: [
        { x: 0, y: 1000 },
        { x: 0.001, y: 900 },
      ],
    },
    {
      name: 'μ max',
      points: [
        { x: 0, y: 1500 },
        { x: 0.0005, y: 1400 },
      ],
    },
  ],
  referenceLines: [{ label: 'Required', axis: 'y', value: 800 }],
  markers: [{ label: 'Set point', x: 0, y: 1000 }],
};

describe('toDisplayChart', () => {
  it('converts to the display system and lays series out by x with gaps as null', () => {
    const d = toDisplayChart(chart, 'SI');
    expect(d.xLabel).toBe('Lining wear (mm)');
    expect(d.yLabel).toBe('Brake torque (N·m)');
    expect(d.rows.map((r) => r.x)).toEqual([0, 0.5, 1]);
    expect(d.rows[1]).toEqual({ x: 0.5, 'μ min': null, 'μ max': 1400 });
    expect(d.referenceLines[0]).toMatchObject({ axis: 'y', value: 800 });
  });

  it('gives US customary values and labels', () => {
    const d = toDisplayChart(chart, 'US');
    expect(d.xLabel).toBe('Lining wear (in)');
    expect(d.yLabel).toBe('Brake torque (lbf·ft)');
    expect(Math.abs((d.rows[0]!['μ min'] as number) - 737.562)).toBeLessThan(0.01);
    expect(Math.abs(d.referenceLines[0]!.value - 590.05)).toBeLessThan(0.01);
    expect(d.referenceLines[0]!.label).toMatch(/^Required: 590\.0 lbf·ft$/);
    expect(Math.abs(d.markers[0]!.y - 737.562)).toBeLessThan(0.01);
  });
});
