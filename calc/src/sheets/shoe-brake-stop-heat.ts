import type { ChartData, CheckResult } from '../core/types.js';
import type { Derivation } from '../core/step.js';
import type { LiningMaterial } from '../criteria/linings.js';
import { stopEnergyParts } from '../energy/stop-energy.js';
import { heatBalance } from '../energy/heat-balance.js';
import { stopping, type StoppingResult } from '../stopping/stopping.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import { stoppingChart, temperatureChart } from './charts.js';
import type { ShoeInputs } from './shoe-brake-fields.js';
import type { ShoeDuty } from './shoe-brake-evaluate.js';

/** The stop at μ min and fully worn lining (section 'stopping'). */
export function shoeStop(duty: ShoeDuty, wornMinTorque: q.Torque, d: Derivation): StoppingResult {
  d.section = 'stopping';
  return stopping(
    {
      inertia: q.inertia(duty.inertia),
      speed: q.angularSpeed(duty.brakeSpeed),
      loadSpeed: q.speed(duty.loadSpeed),
      brakeTorque: wornMinTorque,
      driveTorque: q.torque(duty.driveTorque),
      setDelay: q.time(duty.setDelay),
    },
    d,
  );
}

/** The check that the brake overcomes the driving torque at all, and the stopping chart. */
export function shoeStopsCheck(
  duty: ShoeDuty,
  wornMinTorque: number,
  stop: StoppingResult,
): { check: CheckResult; chart: ChartData } {
  const kv = duty.loadSpeed / duty.brakeSpeed;
  return {
    check: makeCheck({
      id: 'stops-load',
      section: 'stopping',
      label: `Lowest brake torque in service exceeds the driving torque while ${duty.stopCase}`,
      value: wornMinTorque,
      limit: duty.driveTorque,
      kind: 'min',
      strict: true,
      dimension: 'torque',
      source: 'rigid-body dynamics: the load stops only if M_b > M_d',
      failHint: 'The load is never stopped.',
    }),
    chart: stoppingChart(
      duty.loadSpeed,
      kv,
      duty.setDelay,
      stop,
      ((duty.driveTorque - wornMinTorque) / duty.inertia) * kv,
    ),
  };
}

/**
 * Stopping distance against its limit, then the energy of one stop and the drum's heat balance
 * (section 'thermal'), for a stop that comes to rest.
 */
export function shoeStopDistanceAndHeat(
  v: ShoeInputs,
  duty: ShoeDuty,
  stop: Extract<StoppingResult, { stops: true }>,
  lining: LiningMaterial,
  d: Derivation,
): { checks: CheckResult[]; chart: ChartData } {
  const checks: CheckResult[] = [];
  if (duty.stopLimit) {
    checks.push(
      makeCheck({
        id: 'stopping-distance',
        section: 'stopping',
        label: 'Stopping distance at the load ≤ allowed',
        value: stop.stoppingDistance,
        limit: duty.stopLimit.value,
        kind: 'max',
        dimension: 'length',
        source: duty.stopLimit.source,
      }),
    );
  }
  d.section = 'thermal';
  stopEnergyParts(
    q.inertia(duty.inertia),
    stop.speedAfterDelay,
    duty.driveTorque,
    stop.brakingTime,
    d,
  );
  const { z, Tamb, dT, Tss, tau, Tpeak } = heatBalance(
    {
      // Service and emergency stops both at the emergency stop's energy (conservative).
      stopsPerHour: v.stopsPerHour + v.emergencyStopsPerHour,
      stopEnergy: stop.brakeEnergy,
      mass: v.drumMass,
      specificHeat: v.specificHeat,
      coolingCoefficient: v.coolingCoefficient,
      coolingArea: v.coolingArea,
      ambient: v.ambient,
    },
    d,
  );
  checks.push(
    makeCheck({
      id: 'temperature-steady',
      section: 'thermal',
      label: 'Mean steady bulk drum temperature ≤ lining max operating temperature',
      value: Tss,
      limit: lining.maxOperatingTemperature,
      kind: 'max',
      dimension: 'temperature',
      base: Tamb,
      source: `${lining.source} (${lining.label})`,
    }),
    makeCheck({
      id: 'temperature-peak',
      section: 'thermal',
      label:
        'Peak bulk drum temperature (not the rubbing surface) ≤ lining max operating temperature (μ min relied on)',
      value: Tpeak,
      limit: lining.maxOperatingTemperature,
      kind: 'max',
      dimension: 'temperature',
      base: Tamb,
      source: `${lining.source} (${lining.label}), max operating temperature; the table's short-time maximum (${(lining.maxTemperature - 273.15).toFixed(0)} °C) is where the lining is destroyed, not where μ min still holds: the lining maker's rated temperature governs (common practice)`,
      failHint:
        'Above this the friction coefficient may fall below μ min: ask the lining maker for the rated temperature, or cut the stops per hour.',
    }),
  );
  return {
    checks,
    chart: temperatureChart(
      Tamb,
      dT,
      z,
      tau,
      lining.maxTemperature,
      lining.maxOperatingTemperature,
    ),
  };
}
