import { describe, expect, it } from 'vitest';
import { realPrintable } from '../testing/real-sheet.js';
import { afterSettingLines } from './after-setting.js';

const lines = (sheetTypeId: string, unitSystem: 'SI' | 'US' = 'SI') =>
  afterSettingLines(realPrintable({ sheetTypeId, state: 'approved', unitSystem })).join('\n');

describe('the checks after setting, as the card prints them', () => {
  it('a hoist: static test at 1.25 × rated load, its own settings measured again', () => {
    const text = lines('hoist-shoe-brake');
    expect(text).toContain('test load of 12500 kg');
    expect(text).toContain(
      'measure the spring length, the reserve stroke, the shoe clearance and the disc-spring stack lengths again',
    );
    // The demo lining's limit and the steady bulk temperature the sheet works out.
    expect(text).toMatch(/above the lining's limit of 225 °C \(the sheet expects about \d+ °C/);
    // The demo's 3 mm minimum lining and 400 mm drum less 4 mm of wear.
    expect(text).toContain(
      'Wear limits for later visits: linings at least 3.00 mm thick (replace both shoes below it); drum diameter at least 396.0 mm.',
    );
  });

  it('a caliper: pads, a disc and an air gap; no spring length, reserve stroke or preload', () => {
    const text = lines('caliper-disc-brake');
    expect(text).toContain('no pad drags on the disc');
    expect(text).toContain('measure the air gap again');
    expect(text).not.toMatch(/spring length|reserve stroke|preload|shoe|drum/);
    // The allowed stopping distance, from the sheet, not "the stopping distance on the sheet".
    expect(text).toMatch(/within 300 mm \(the sheet works out \d+ mm\)/);
  });

  it('a disc-spring stack sheet: no stop and no temperature to compare, its stacks re-measured', () => {
    const text = lines('disc-spring-stack');
    expect(text).not.toMatch(/Dynamic test|Static test|thermometer/);
    expect(text).toContain('measure the disc-spring stack lengths again');
  });

  it('in US units the figures are in US units', () => {
    const text = lines('travel-shoe-brake', 'US');
    expect(text).toMatch(/limit of 437 °F/);
    expect(text).toMatch(/within [\d.]+ (in|ft)/);
  });
});
