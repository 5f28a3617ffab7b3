import type { Derivation } from '../core/step.js';
import type { BrakeRotor } from '../core/types.js';
import * as q from '../units/quantities.js';
import {
  averageHeat,
  coolingTimeConstant,
  energyPerHour,
  peakCycleTemperature,
  steadyTemperature,
  temperatureRise,
} from './heat.js';

/** SI inputs of a heat balance: the heat mass (drum or disc) and its duty. */
export interface HeatBalanceInput {
  /** Stops per hour, 1/s. */
  stopsPerHour: number;
  /** Energy the brake absorbs in one stop, J. */
  stopEnergy: number;
  /** Heat-absorbing mass, kg. */
  mass: number;
  /** Specific heat of the heat mass, J/(kg·K). */
  specificHeat: number;
  /** Cooling (heat-transfer) coefficient, W/(m²·K). */
  coolingCoefficient: number;
  /** Cooling surface, m². */
  coolingArea: number;
  /** Ambient temperature, K. */
  ambient: number;
}

/**
 * The heat balance shared by drum and disc sheets: energy per hour, average heat input, adiabatic
 * rise per stop, steady temperature from surface cooling, cooling time constant and the peak of the
 * cyclic temperature. Each value is recorded as a derivation step in `d` (see energy/heat.ts for the
 * formulas and their sources).
 */
export function heatBalance(input: HeatBalanceInput, d: Derivation, rotor: BrakeRotor = 'drum') {
  // The formulas' own labels speak of a drum; a caliper sheet's steps name its disc.
  const disc = rotor === 'disc';
  const z = q.frequency(input.stopsPerHour);
  const E = q.energy(input.stopEnergy);
  const m = q.mass(input.mass);
  const c = q.specificHeat(input.specificHeat);
  const alpha = q.heatTransferCoefficient(input.coolingCoefficient);
  const A = q.area(input.coolingArea);
  const Tamb = q.temperature(input.ambient);
  energyPerHour(z, E, d);
  const P = averageHeat(z, E, d);
  const dT = temperatureRise(E, m, c, d);
  const Tss = steadyTemperature(
    { ambient: Tamb, averageHeat: P, coefficient: alpha, area: A },
    d,
    disc ? { label: 'Mean steady disc temperature' } : undefined,
  );
  const tau = coolingTimeConstant(m, c, alpha, A, d);
  const Tpeak =
    z > 0
      ? peakCycleTemperature(
          Tamb,
          dT,
          z,
          tau,
          d,
          disc ? { label: 'Peak disc temperature in steady cyclic duty' } : undefined,
        )
      : q.temperature(Tamb + dT);
  return { z, Tamb, dT, Tss, tau, Tpeak };
}
