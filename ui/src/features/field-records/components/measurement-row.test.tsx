import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import { springTarget } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import type { FieldTarget } from '@holdfast/shared';
import { MeasurementRow } from './measurement-row';
import type { MeasurementDraft } from './measurement-entry';

// A steel-rule length set to 0.5 mm steps, read to 0.1 mm (calc's precision table).
const spring = springTarget(0.124, 'Main spring length as set');

/** The row of `target` with an as-left value (or none) typed in. */
function renderRow(target: FieldTarget, asLeft: MeasurementDraft['asLeft']) {
  return renderWithProviders(
    <MeasurementRow
      target={target}
      draft={{ asLeft, reason: '' }}
      withAsFound={false}
      errors={{}}
      onChange={() => undefined}
    />,
  );
}

describe('a measured value on the record form', () => {
  it('gives its deviation to a tenth of the setting step, as the reading prints', () => {
    renderRow(spring, { value: 124.3, unit: 'mm' });
    // To the setting's own 0.5 mm step this read "+0.5 mm", at the edge of the band.
    expect(screen.getByText(/In tolerance/)).toHaveTextContent('In tolerance (+0.3 mm)');
  });

  it('reads ±0 for a deviation too small to print, never −0', () => {
    // 123.99 mm against 124 mm: −0.01 mm, under the 0.1 mm the reading prints to.
    renderRow(spring, { value: 123.99, unit: 'mm' });
    expect(screen.getByText(/In tolerance/)).toHaveTextContent('In tolerance (±0 mm)');
  });

  it('says which values the tolerance accepts, as a fitter reads them', () => {
    const force = {
      ...spring,
      settingKey: 'springForce',
      label: 'Main spring force as set',
      value: 1150,
      unit: 'N',
      dimension: 'force' as const,
      tolerance: {
        band: { kind: 'relative' as const, minus: 30 / 1150, plus: 20 / 1150 },
        source: 'common practice; narrowed to the band where every check of this sheet passes',
        confidence: 'common practice' as const,
      },
    };
    renderRow(force, undefined);
    expect(screen.getByText(/^Target 1150 N/)).toHaveTextContent(
      'Target 1150 N, tolerance −2.61 % / +1.74 % (common practice; narrowed to the band where every check of this sheet passes); accepted 1120 to 1170 N',
    );
  });

  it('gives the accepted lengths to the reading precision', () => {
    renderRow(spring, undefined);
    expect(screen.getByText(/^Target/)).toHaveTextContent('accepted 123.5 to 124.5 mm');
  });

  it('rounds the accepted ends inward: 221.25 mm ± 0.5 mm is 220.8 to 221.7 mm', () => {
    // To the nearest tenth the top end would read 221.8 mm, which the record judges out.
    renderRow({ ...spring, value: 0.22125 }, undefined);
    expect(screen.getByText(/^Target/)).toHaveTextContent('accepted 220.8 to 221.7 mm');
  });

  it("judges a reserve stroke as found against the in-service minimum, in the fitter's words", () => {
    const reserve: FieldTarget = {
      ...springTarget(0.02, 'Reserve stroke to set (new lining)'),
      settingKey: 'reserveStroke',
      group: 'thruster',
      tolerance: {
        band: { kind: 'absolute', minus: 0, plus: 0.003 },
        source: 'common practice',
        confidence: 'common practice',
      },
      inService: inService(0.005, 'atLeast'),
    };
    // 16 mm found, 20 mm set: lining wear, not a fault.
    const found = renderFound(reserve, 16);
    expect(screen.getByText(/^Serviceable/)).toHaveTextContent(
      'Serviceable: 11.0 mm above the 5.0 mm minimum',
    );
    found.unmount();
    renderFound(reserve, 4);
    expect(screen.getByText(/^Below the/)).toHaveTextContent('Below the 5.0 mm minimum: re-adjust');
  });

  it('says what is wrong with a reading as it is typed, before any save', () => {
    renderRow(spring, { value: -1.2, unit: 'mm' });
    expect(screen.getByText('A reading cannot be negative')).toBeInTheDocument();
  });

  it('judges a clearance that grows with wear against its in-service maximum', () => {
    const clearance: FieldTarget = {
      ...springTarget(0.0012, 'Shoe clearance when released (each side, equal)'),
      settingKey: 'shoeClearance',
      group: 'clearance',
      inService: inService(0.0018, 'atMost'),
    };
    const found = renderFound(clearance, 1.25);
    expect(screen.getByText(/^Serviceable/)).toHaveTextContent(
      'Serviceable: 0.55 mm below the 1.80 mm in-service maximum',
    );
    found.unmount();
    renderFound(clearance, 1.9);
    expect(screen.getByText(/^Above the/)).toHaveTextContent(
      'Above the 1.80 mm in-service maximum: re-adjust',
    );
  });
});

/** An in-service limit of a target, as the field form carries it. */
function inService(value: number, kind: 'atLeast' | 'atMost'): FieldTarget['inService'] {
  return {
    value,
    label: 'in service',
    tolerance: { band: { kind }, source: 'in service', confidence: 'common practice' },
  };
}

/** The row of `target` with an as-found reading in mm typed in, on an inspection. */
function renderFound(target: FieldTarget, mm: number) {
  return renderWithProviders(
    <MeasurementRow
      target={target}
      draft={{ asFound: { value: mm, unit: 'mm' }, asLeft: undefined, reason: '' }}
      withAsFound
      errors={{}}
      onChange={() => undefined}
    />,
  );
}
