import { defineCase } from '../../case.js';
import { fromSI, speed, tenPercentStoppingDistance, toSI } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'st-29cfr-ten-percent',
  family: 'stopping',
  title: 'Bridge/trolley brake: allowed stopping distance at 100 and 250 ft/min',
  source:
    '29 CFR 1910.179(f)(4)(vii) (brakes for trolleys and bridges): stop within a distance in feet equal to 10 % of full-load speed in feet per minute (reference-values.md §3)',
  confidence: 'published',
  inputs: { 'full-load speed': '100 ft/min and 250 ft/min' },
  expected: [
    { key: 'd100', label: 'Allowed distance at 100 ft/min', value: 10, unit: 'ft', rel: 1e-9 },
    { key: 'd250', label: 'Allowed distance at 250 ft/min', value: 25, unit: 'ft', rel: 1e-9 },
  ],
  toleranceNote: 'exact rule; checks the unit handling ft/min → SI → ft',
  run: () => ({
    d100: fromSI(tenPercentStoppingDistance(speed(toSI(100, 'ft/min', 'speed'))), 'ft', 'length'),
    d250: fromSI(tenPercentStoppingDistance(speed(toSI(250, 'ft/min', 'speed'))), 'ft', 'length'),
  }),
});
