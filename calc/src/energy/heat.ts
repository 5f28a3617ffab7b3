import { compute, defineFormula, Derivation, type StepOptions } from '../core/step.js';
import { REF } from '../core/references.js';
import { requireRange } from '../units/parse.js';
import type {
  Area,
  Energy,
  Frequency,
  HeatTransferCoefficient,
  Mass,
  Power,
  SpecificHeat,
  Temperature,
  TemperatureDifference,
  Time,
} from '../units/quantities.js';

export const energyPerHourFormula = defineFormula({
  id: 'energy-per-hour',
  label: 'Brake energy per hour',
  symbol: 'E_h',
  expression: 'z * E_s * t_h',
  symbols: {
    z: { text: 'z', dimension: 'frequency' },
    E_s: { text: 'E_stop', dimension: 'energy' },
    t_h: { text: '1 h', dimension: 'time' },
  },
  dimension: 'energy',
  reference: REF.energy,
});

export const averageHeatFormula = defineFormula({
  id: 'average-heat',
  label: 'Average heat input',
  symbol: 'P_avg',
  expression: 'z * E_s',
  symbols: {
    z: { text: 'z', dimension: 'frequency' },
    E_s: { text: 'E_stop', dimension: 'energy' },
  },
  dimension: 'power',
  reference: REF.energy,
});

export const temperatureRiseFormula = defineFormula({
  id: 'temperature-rise',
  label: 'Temperature rise per stop (adiabatic heat mass)',
  symbol: 'ΔT',
  expression: 'E / (m * c)',
  symbols: {
    E: { text: 'E_stop', dimension: 'energy' },
    m: { text: 'm_d', dimension: 'mass' },
    c: { text: 'c', dimension: 'specificHeat' },
  },
  dimension: 'temperatureDifference',
  reference: REF.heat,
});

export const steadyTemperatureFormula = defineFormula({
  id: 'steady-temperature',
  label: 'Mean steady drum temperature',
  symbol: 'T_ss',
  expression: 'T_amb + P / (alpha * A)',
  symbols: {
    T_amb: { text: 'T_amb', dimension: 'temperature' },
    P: { text: 'P_avg', dimension: 'power' },
    alpha: { text: 'α', dimension: 'heatTransferCoefficient' },
    A: { text: 'A_c', dimension: 'area' },
  },
  dimension: 'temperature',
  reference: REF.cooling,
});

export const timeConstantFormula = defineFormula({
  id: 'cooling-time-constant',
  label: 'Cooling time constant of the heat mass',
  symbol: 'τ',
  expression: 'm * c / (alpha * A)',
  symbols: {
    m: { text: 'm_d', dimension: 'mass' },
    c: { text: 'c', dimension: 'specificHeat' },
    alpha: { text: 'α', dimension: 'heatTransferCoefficient' },
    A: { text: 'A_c', dimension: 'area' },
  },
  dimension: 'time',
  reference: REF.cooling,
});

export const peakTemperatureFormula = defineFormula({
  id: 'peak-temperature',
  label: 'Peak drum temperature in steady cyclic duty',
  symbol: 'T_peak',
  expression: 'T_amb + dT / (-expm1(-1 / (z * tau)))',
  symbols: {
    T_amb: { text: 'T_amb', dimension: 'temperature' },
    dT: { text: 'ΔT', dimension: 'temperatureDifference' },
    z: { text: 'z', dimension: 'frequency' },
    tau: { text: 'τ', dimension: 'time' },
  },
  dimension: 'temperature',
  reference: `${REF.cooling}; periodic solution for equal stops every 1/z`,
});

export const temperatureAfterStopFormula = defineFormula({
  id: 'temperature-after-stop',
  label: 'Bulk temperature of the heat mass after one stop from a known temperature',
  symbol: 'T_1',
  expression: 'T_0 + dT',
  symbols: {
    T_0: { text: 'T_0', dimension: 'temperature' },
    dT: { text: 'ΔT', dimension: 'temperatureDifference' },
  },
  dimension: 'temperature',
  reference: `${REF.heat}; the stop's heat stays in the heat mass (no cooling during the stop)`,
});

/** Energy per hour E_h = z·E_stop·1 h (z in stops per second inside the core). */
export function energyPerHour(
  stopsPerSecond: Frequency,
  stopEnergy: Energy,
  d?: Derivation,
): Energy {
  requireRange(stopsPerSecond, 'stopsPerHour', { min: 0 }, '1/s');
  return compute(d, energyPerHourFormula, { z: stopsPerSecond, E_s: stopEnergy, t_h: 3600 });
}

/** Average heat input P = z·E_stop. */
export function averageHeat(stopsPerSecond: Frequency, stopEnergy: Energy, d?: Derivation): Power {
  return compute(d, averageHeatFormula, { z: stopsPerSecond, E_s: stopEnergy });
}

/**
 * Adiabatic temperature rise ΔT = E/(m·c) of the heat-absorbing mass.
 * Source: Shigley's MED 8th ed., §16-10; OpenStax College Physics Example 14.2 (ΔT = 91.875 °C).
 * @example temperatureRise(energy(7_350_000), mass(100), specificHeat(800)) // 91.875 K
 */
export function temperatureRise(
  E: Energy,
  m: Mass,
  c: SpecificHeat,
  d?: Derivation,
): TemperatureDifference {
  requireRange(m, 'heatMass', { min: 0, exclusiveMin: true }, 'kg');
  requireRange(c, 'specificHeat', { min: 0, exclusiveMin: true }, 'J/(kg·K)');
  return compute(d, temperatureRiseFormula, { E, m, c });
}

export interface CoolingInput {
  ambient: Temperature;
  averageHeat: Power;
  coefficient: HeatTransferCoefficient;
  area: Area;
}

/**
 * Mean steady temperature of a drum cooled by convection: T = T_amb + P_avg/(α·A).
 * @example steadyTemperature({ ambient: celsius(20), averageHeat: power(500),
 *   coefficient: heatTransferCoefficient(25), area: area(0.5) }) // 333.15 K (60 °C)
 */
export function steadyTemperature(
  input: CoolingInput,
  d?: Derivation,
  options?: StepOptions,
): Temperature {
  requireRange(input.coefficient, 'coolingCoefficient', { min: 0, exclusiveMin: true }, 'W/(m²·K)');
  requireRange(input.area, 'coolingArea', { min: 0, exclusiveMin: true }, 'm²');
  return compute(
    d,
    steadyTemperatureFormula,
    { T_amb: input.ambient, P: input.averageHeat, alpha: input.coefficient, A: input.area },
    options,
  );
}

/** Cooling time constant τ = m·c/(α·A). */
export function coolingTimeConstant(
  m: Mass,
  c: SpecificHeat,
  coefficient: HeatTransferCoefficient,
  a: Area,
  d?: Derivation,
): Time {
  requireRange(m, 'heatMass', { min: 0, exclusiveMin: true }, 'kg');
  requireRange(coefficient, 'coolingCoefficient', { min: 0, exclusiveMin: true }, 'W/(m²·K)');
  requireRange(a, 'coolingArea', { min: 0, exclusiveMin: true }, 'm²');
  return compute(d, timeConstantFormula, { m, c, alpha: coefficient, A: a });
}

/**
 * Peak temperature in steady cyclic duty: stops of ΔT every 1/z with exponential cooling in between
 * settle at T_peak = T_amb + ΔT/(1 − e^{−1/(z·τ)}). Requires z > 0.
 */
export function peakCycleTemperature(
  ambient: Temperature,
  rise: TemperatureDifference,
  stopsPerSecond: Frequency,
  tau: Time,
  d?: Derivation,
  options?: StepOptions,
): Temperature {
  requireRange(stopsPerSecond, 'stopsPerHour', { min: 0, exclusiveMin: true }, '1/s');
  return compute(
    d,
    peakTemperatureFormula,
    { T_amb: ambient, dT: rise, z: stopsPerSecond, tau },
    options,
  );
}

/**
 * Drum temperature over `duration` seconds of duty starting at ambient: a jump of ΔT at each stop
 * (stops evenly spaced, first at t = 0) and exponential cooling toward ambient in between.
 * Returns points (t in s, T in K) just before and after each stop plus the end point.
 */
export function temperatureHistory(
  ambient: number,
  rise: number,
  stopsPerSecond: number,
  tau: number,
  duration = 3600,
  maxStops = 400,
): { x: number; y: number }[] {
  const points: { x: number; y: number }[] = [{ x: 0, y: ambient }];
  if (!(stopsPerSecond > 0)) {
    points.push({ x: duration, y: ambient });
    return points;
  }
  // With very frequent stops, draw one jump per group of stops so the chart stays small.
  const stops = Math.floor(duration * stopsPerSecond);
  const group = Math.max(1, Math.ceil(stops / maxStops));
  const interval = group / stopsPerSecond;
  const groupRise = rise * group;
  let t = 0;
  let excess = 0;
  while (t < duration) {
    excess += groupRise;
    points.push({ x: t, y: ambient + excess });
    const next = Math.min(t + interval, duration);
    excess *= Math.exp(-(next - t) / tau);
    points.push({ x: next, y: ambient + excess });
    t = next;
  }
  return points;
}
