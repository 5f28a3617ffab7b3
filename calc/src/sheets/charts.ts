import type { BrakeRotor, ChartData } from '../core/types.js';
import { temperatureHistory } from '../energy/heat.js';
import type { StoppingResult } from '../stopping/stopping.js';

/**
 * Load speed against time through the set delay and the braking phase. `kv` = load speed per
 * brake-shaft rad/s; `netLoadAccel` = load acceleration after the brake sets when it cannot stop.
 */
export function stoppingChart(
  v0: number,
  kv: number,
  setDelay: number,
  r: StoppingResult,
  netLoadAccel: number,
): ChartData {
  const points = [{ x: 0, y: v0 }];
  const vSet = r.speedAfterDelay * kv;
  if (r.stops) {
    points.push({ x: setDelay, y: vSet }, { x: r.stoppingTime, y: 0 });
  } else {
    // Never stops: show the speed still rising for two seconds after the brake sets.
    points.push({ x: setDelay, y: vSet }, { x: setDelay + 2, y: vSet + netLoadAccel * 2 });
  }
  return {
    id: 'stopping',
    title: 'Load speed during the stop',
    xLabel: 'Time',
    xUnit: 's',
    xDimension: 'time',
    yLabel: 'Load speed',
    yUnit: 'm/s',
    yDimension: 'speed',
    series: [{ name: 'Load speed', points }],
    referenceLines: [{ label: 'Brake sets', axis: 'x', value: setDelay }],
  };
}

/** Title and axes of the shoe brake's torque–wear chart (its stroke chain). */
export const TORQUE_WEAR_AXES = {
  id: 'torque-wear',
  title: 'Brake torque against lining wear',
  xLabel: 'Lining wear per shoe',
  xUnit: 'm',
  xDimension: 'length',
  yLabel: 'Brake torque',
  yUnit: 'N m',
  yDimension: 'torque',
} as const satisfies Partial<ChartData>;

/** A caliper's torque–wear chart: its pads wear, not a shoe's lining. */
const PAD_WEAR_AXES = {
  ...TORQUE_WEAR_AXES,
  title: 'Brake torque against pad wear',
  xLabel: 'Pad wear per pad',
} as const satisfies Partial<ChartData>;

/** A caliper's brake torque against pad wear at μ min and μ nominal, with the required torque line. */
export function torqueWearChart(
  torqueNewNominal: number,
  torqueNewMin: number,
  springForce: number,
  rate: number,
  travelRatio: number,
  wearAllowance: number,
  required: number,
  points = 41,
): ChartData {
  // Wear at which the spring would go slack (infinite for a rigid-rate-free spring), and a sweep
  // to 2.5 × the allowance (2 mm when no wear is allowed) but never past slack.
  const slackWear =
    rate * travelRatio > 0 ? springForce / (rate * travelRatio) : Number.POSITIVE_INFINITY;
  const maxWear = Math.min(slackWear, wearAllowance > 0 ? wearAllowance * 2.5 : 0.002);
  const nominal: { x: number; y: number }[] = [];
  const min: { x: number; y: number }[] = [];
  for (let k = 0; k < points; k++) {
    const w = (maxWear * k) / (points - 1);
    const f = Math.max(0, (springForce - rate * w * travelRatio) / springForce);
    nominal.push({ x: w, y: torqueNewNominal * f });
    min.push({ x: w, y: torqueNewMin * f });
  }
  return {
    ...PAD_WEAR_AXES,
    series: [
      { name: 'μ nominal', points: nominal },
      { name: 'μ min', points: min },
    ],
    referenceLines: [
      { label: 'Required torque', axis: 'y', value: required },
      { label: 'Wear allowance', axis: 'x', value: wearAllowance },
    ],
  };
}

/**
 * Brake torque across the friction band (new and worn lining, or pads on a caliper), with the
 * required and maximum lines.
 */
export function frictionBandChart(
  torquePerMu: number,
  wornFraction: number,
  muMin: number,
  muNominal: number,
  muMax: number,
  required: number,
  maxTorque: number,
  rotor: BrakeRotor = 'drum',
  points = 21,
): ChartData {
  const fresh: { x: number; y: number }[] = [];
  const worn: { x: number; y: number }[] = [];
  for (let k = 0; k < points; k++) {
    const mu = muMin + ((muMax - muMin) * k) / (points - 1);
    fresh.push({ x: mu, y: torquePerMu * mu });
    worn.push({ x: mu, y: torquePerMu * mu * wornFraction });
  }
  return {
    id: 'torque-friction',
    title: 'Brake torque across the friction band',
    xLabel: 'Friction coefficient μ',
    xUnit: '',
    xDimension: 'dimensionless',
    yLabel: 'Brake torque',
    yUnit: 'N m',
    yDimension: 'torque',
    series: [
      { name: rotor === 'disc' ? 'New pads' : 'New lining', points: fresh },
      { name: rotor === 'disc' ? 'Worn pads' : 'Worn lining', points: worn },
    ],
    markers: [{ label: 'μ nominal', x: muNominal, y: torquePerMu * muNominal }],
    referenceLines: [
      { label: 'Required torque', axis: 'y', value: required },
      { label: 'Drive-train rating', axis: 'y', value: maxTorque },
    ],
  };
}

/**
 * Temperature of the heat mass (drum, or a caliper's disc) over one hour of duty (stops evenly
 * spaced, exponential cooling between), against the friction material's limits and the mean
 * steady temperature it tends to.
 */
export function temperatureChart(
  ambient: number,
  rise: number,
  stopsPerSecond: number,
  tau: number,
  maxTemperature: number,
  maxOperating: number,
  rotor: BrakeRotor = 'drum',
): ChartData {
  const mass = rotor === 'disc' ? 'Disc' : 'Drum';
  const friction = rotor === 'disc' ? 'Pad' : 'Lining';
  return {
    id: 'drum-temperature',
    title: `${mass} temperature over an hour of duty`,
    xLabel: 'Time',
    xUnit: 's',
    xDimension: 'time',
    yLabel: `${mass} temperature`,
    yUnit: 'K',
    yDimension: 'temperature',
    series: [
      {
        name: `${mass} temperature`,
        points: temperatureHistory(ambient, rise, stopsPerSecond, tau, 3600, 240),
      },
    ],
    referenceLines: [
      // Where the hour's curve is heading (mean of the saw-tooth after many hours): the chart ends
      // below it, and the steady-temperature check reads this value, not the curve's end.
      {
        label: 'Mean steady temperature (long run)',
        axis: 'y',
        value: ambient + rise * stopsPerSecond * tau,
      },
      { label: `${friction} max operating temperature`, axis: 'y', value: maxOperating },
      { label: `${friction} max temperature`, axis: 'y', value: maxTemperature },
    ],
  };
}
