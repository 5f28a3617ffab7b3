/**
 * Friction-lining data for the lining checks. Values from the Tribology Handbook (M. J. Neale,
 * ed., 2nd ed., section B8 "Brakes and clutches", Table 8.10): typical μ, maximum temperature,
 * maximum operating temperature, working pressure range and maximum pressure. Typical values
 * only: the lining maker's data sheet governs.
 */
export interface LiningMaterial {
  id: string;
  label: string;
  muTypical: number;
  /** Maximum (short-time) temperature, K. */
  maxTemperature: number;
  /** Maximum continuous operating temperature, K. */
  maxOperatingTemperature: number;
  /** Working pressure range, Pa. */
  workingPressureMin: number;
  workingPressureMax: number;
  /** Maximum pressure, Pa. */
  maxPressure: number;
  source: string;
}

const SOURCE = 'published: Tribology Handbook (Neale, ed.), 2nd ed., B8, Table 8.10';
const C = (t: number) => t + 273.15;
const kPa = 1e3;
const MPa = 1e6;

export const LININGS: readonly LiningMaterial[] = [
  {
    id: 'woven-cotton',
    label: 'Woven cotton',
    muTypical: 0.5,
    maxTemperature: C(150),
    maxOperatingTemperature: C(100),
    workingPressureMin: 70 * kPa,
    workingPressureMax: 700 * kPa,
    maxPressure: 1.5 * MPa,
    source: SOURCE,
  },
  {
    id: 'non-asbestos-flexible',
    label: 'Non-asbestos, light duty (flexible)',
    muTypical: 0.38,
    maxTemperature: C(350),
    maxOperatingTemperature: C(175),
    workingPressureMin: 70 * kPa,
    workingPressureMax: 700 * kPa,
    maxPressure: 2.1 * MPa,
    source: SOURCE,
  },
  {
    id: 'non-asbestos-semi-flexible',
    label: 'Non-asbestos, medium duty (semi-flexible)',
    muTypical: 0.35,
    maxTemperature: C(400),
    maxOperatingTemperature: C(200),
    workingPressureMin: 70 * kPa,
    workingPressureMax: 700 * kPa,
    maxPressure: 2.8 * MPa,
    source: SOURCE,
  },
  {
    id: 'non-asbestos-rigid',
    label: 'Non-asbestos, heavy duty (rigid moulded)',
    muTypical: 0.35,
    maxTemperature: C(500),
    maxOperatingTemperature: C(225),
    workingPressureMin: 70 * kPa,
    workingPressureMax: 700 * kPa,
    maxPressure: 3.8 * MPa,
    source: SOURCE,
  },
  {
    id: 'resin-bonded-pad',
    label: 'Resin-bonded pads',
    muTypical: 0.32,
    maxTemperature: C(650),
    maxOperatingTemperature: C(300),
    workingPressureMin: 350 * kPa,
    workingPressureMax: 1750 * kPa,
    maxPressure: 5.5 * MPa,
    source: SOURCE,
  },
  {
    id: 'sintered-metal-pad',
    label: 'Sintered metal pads',
    muTypical: 0.3,
    maxTemperature: C(650),
    maxOperatingTemperature: C(300),
    workingPressureMin: 350 * kPa,
    workingPressureMax: 3500 * kPa,
    maxPressure: 5.5 * MPa,
    source: SOURCE,
  },
  {
    id: 'cermet-pad',
    label: 'Cermet pads',
    muTypical: 0.32,
    maxTemperature: C(800),
    maxOperatingTemperature: C(400),
    workingPressureMin: 350 * kPa,
    workingPressureMax: 1050 * kPa,
    maxPressure: 5.9 * MPa,
    source: SOURCE,
  },
];

/** Looks up a lining by id; undefined when unknown. */
export function getLining(id: string): LiningMaterial | undefined {
  return LININGS.find((l) => l.id === id);
}
