import { describe, expect, it } from 'vitest';
import { labelPositions } from './chart-card';
import type { DisplayChart } from '../utils/chart-data';

const chart = (lines: DisplayChart['referenceLines']): DisplayChart => ({
  id: 'torque-wear',
  title: 'Brake torque against lining wear',
  xLabel: 'Lining wear per shoe (mm)',
  yLabel: 'Brake torque (N·m)',
  rows: [{ x: 0 }, { x: 1 }],
  seriesNames: [],
  referenceLines: lines,
  markers: [],
});

describe('reference line labels', () => {
  it('keeps two vertical lines near the right end apart: each label on the roomy side, top then bottom', () => {
    const p = labelPositions(
      chart([
        { axis: 'y', value: 179, label: 'Required torque: 179.3 N·m' },
        { axis: 'x', value: 0.8, label: 'Reserve used up: torque lost: 0.80 mm' },
        { axis: 'x', value: 0.6, label: 'Re-adjust: 0.60 mm' },
      ]),
    );
    // Sorted by x: 0.6 first (top), 0.8 second (bottom); both right of the middle: text to the left.
    expect(p).toEqual(['insideBottomRight', 'insideBottomRight', 'insideTopRight']);
  });

  it('puts the label of a line left of the middle on its right', () => {
    expect(labelPositions(chart([{ axis: 'x', value: 0.1, label: 'Brake sets: 0.30 s' }]))).toEqual(
      ['insideTopLeft'],
    );
  });
});
