import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import type { FieldTarget } from '@holdfast/shared';
import { renderWithProviders } from '../../../testing/render';
import { MeasurementRow } from './measurement-row';

// A steel-rule length set to 0.5 mm steps, read to 0.1 mm (calc's precision table).
const spring: FieldTarget = {
  settingKey: 'springLength',
  label: 'Main spring length as set',
  value: 0.124,
  unit: 'm',
  dimension: 'length',
  group: 'spring',
  tolerance: {
    band: { kind: 'absolute', minus: 0.0005, plus: 0.0005 },
    source: 'common practice',
    confidence: 'common practice',
  },
};

describe('a measured value on the record form', () => {
  it('gives its deviation to a tenth of the setting step, as the reading prints', () => {
    renderWithProviders(
      <MeasurementRow
        target={spring}
        draft={{ asLeft: { value: 124.3, unit: 'mm' }, reason: '' }}
        withAsFound={false}
        errors={{}}
        onChange={() => undefined}
      />,
    );
    // To the setting's own 0.5 mm step this read "+0.5 mm", at the edge of the band.
    expect(screen.getByText(/In tolerance/)).toHaveTextContent('In tolerance (+0.3 mm)');
  });
});
