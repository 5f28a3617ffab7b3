import { describe, expect, it } from 'vitest';
import { hoistPrintable } from '../testing/hoist-fixture.js';
import { ensurePoppler, inspectPdf } from '../testing/poppler.js';
import type { PrintableFieldRecord } from './printable-field-record.js';
import { renderFieldRecordPdf } from './render-field-record.js';

// Invented demo record: one setting left outside its band with a reason, one inside.
const record: PrintableFieldRecord = {
  kindLabel: 'Periodic inspection',
  positionTag: 'BR-9',
  performedAt: '2026-11-30T09:15:00Z',
  meterHours: 1234,
  documentNumber: 'HF-DEMO-0009',
  revisionLabel: 'B',
  status: 'signed',
  flags: { superseded: true, underReview: false },
  measurements: [
    {
      settingKey: 'springLength',
      label: 'Main spring length as set',
      target: 0.2225,
      dimension: 'length',
      tolerance: {
        band: { kind: 'absolute', minus: 5e-4, plus: 5e-4 },
        source: 'common practice',
        confidence: 'common practice',
      },
      asFound: 0.2241,
      asLeft: 0.2226,
      asLeftWithin: true,
      reason: '',
    },
    {
      settingKey: 'reserveStroke',
      label: 'Reserve stroke to set (new lining)',
      target: 0.02,
      dimension: 'length',
      tolerance: null,
      asFound: null,
      asLeft: 0.017,
      asLeftWithin: false,
      reason: 'Rod end worn; new rod ordered.',
    },
  ],
  checks: [
    { label: 'Shoes do not drag when released', result: 'ok', value: null, cycles: 5, note: '' },
    {
      label: 'Lining thickness, shoe 1',
      result: 'not-applicable',
      value: 0.009,
      cycles: null,
      note: 'as found',
    },
  ],
  findings: '',
  photos: [
    {
      fileName: 'br-9-spring.jpg',
      sha256: 'a3f1c2d4e5b60718293a4b5c6d7e8f90a1b2c3d4e5f60718293a4b5c6d7e8f9',
      size: 245_760,
      by: 'Tomas Fitter',
      at: '2026-11-30T09:40:00Z',
    },
  ],
  signed: { name: 'Tomas Fitter', initials: 'TF', at: '2026-11-30T10:00:00Z' },
  countersigned: null,
};

describe('printed field record', () => {
  it('prints its own data: kind, meter, verdicts, reasons, checks and signatures', async () => {
    ensurePoppler();
    const sheet = hoistPrintable({ state: 'approved' });
    const pdf = inspectPdf(await renderFieldRecordPdf(record, sheet), 'field-record-fixture');
    const t = pdf.text.replace(/\s+/g, ' ');
    expect(t).toContain('Periodic inspection — BR-9');
    expect(t).toContain('Performed 2026-11-30 09:15 UTC, meter 1234 h');
    expect(t).toContain('Set to calculation HF-DEMO-0009 rev B');
    expect(t).toContain('has since been superseded');
    expect(t).not.toContain('under review');
    expect(t).toMatch(/Main spring length as set 222\.5 mm ± 0\.5 mm 224\.1 mm 222\.6 mm within/);
    expect(t).toMatch(/Reserve stroke to set \(new lining\) 20\.0 mm — — 17\.0 mm OUT/);
    expect(t).toContain(
      'Reason, Reserve stroke to set (new lining): Rod end worn; new rod ordered.',
    );
    expect(t).toContain('5 cycles');
    expect(t).toMatch(/Lining thickness, shoe 1 n\/a 9\.00 mm; as found/);
    expect(t).toContain('None recorded.');
    expect(t).toMatch(
      /br-9-spring\.jpg Tomas Fitter, 2026-11-30 09:40 UTC 240 KiB a3f1c2d4e5b60718/,
    );
    expect(t).toContain('Tomas Fitter (TF)');
    expect(t).toContain('not countersigned');
  }, 120_000);
});
