import type {
  ChartData,
  CheckResult,
  CriteriaSet,
  FieldSetting,
  SheetEvaluation,
} from '../core/types.js';
import { compute, type Derivation } from '../core/step.js';
import { criterion } from '../criteria/lookup.js';
import type { LiningMaterial } from '../criteria/linings.js';
import { stopEnergyParts } from '../energy/stop-energy.js';
import { heatBalance } from '../energy/heat-balance.js';
import { releasedSpringForceFormula, forceMarginFormula } from '../release/release.js';
import { stopping, type StoppingResult } from '../stopping/stopping.js';
import * as q from '../units/quantities.js';
import { makeCheck } from './checks.js';
import { stoppingChart, temperatureChart } from './charts.js';
import type { CaliperInputs } from './caliper-disc-brake-fields.js';
import type { CaliperDuty, CaliperTorques } from './caliper-disc-brake-torque.js';

/** The stop at μ min and worn pads, then its energy and the disc's heat balance. */
export function caliperStopAndHeat(
  v: CaliperInputs,
  duty: CaliperDuty,
  t: CaliperTorques,
  lining: LiningMaterial,
  d: Derivation,
): {
  checks: CheckResult[];
  charts: ChartData[];
  warnings: string[];
  stop: StoppingResult;
  /** Peak bulk disc temperature of normal duty, K; absent when the load is never stopped. */
  peakTemperature?: number;
} {
  const Mhold = duty.driveTorque;
  const omega = duty.brakeSpeed;
  d.section = 'stopping';
  const stop = stopping(
    {
      inertia: q.inertia(v.inertia),
      speed: omega,
      loadSpeed: q.speed(v.loadSpeed),
      brakeTorque: t.wornMin,
      driveTorque: q.torque(Mhold),
      setDelay: q.time(v.setDelay),
    },
    d,
  );
  const kv = v.loadSpeed / omega;
  const charts = [
    stoppingChart(v.loadSpeed, kv, v.setDelay, stop, ((Mhold - t.wornMin) / v.inertia) * kv),
  ];
  if (!stop.stops) {
    return {
      checks: [],
      charts,
      warnings: [`${stop.message} Stopping distance and heat are not computed.`],
      stop,
    };
  }
  const checks = [
    makeCheck({
      id: 'stopping-distance',
      section: 'stopping',
      label: 'Stopping distance at the load ≤ allowed',
      value: stop.stoppingDistance,
      limit: v.maxStoppingDistance,
      kind: 'max',
      dimension: 'length',
      source: 'duty specification (user input)',
    }),
  ];
  d.section = 'thermal';
  stopEnergyParts(q.inertia(v.inertia), stop.speedAfterDelay, Mhold, stop.brakingTime, d);
  const { z, Tamb, dT, Tss, tau, Tpeak } = heatBalance(
    {
      // Service and emergency stops both at the emergency stop's energy (conservative).
      stopsPerHour: v.stopsPerHour + v.emergencyStopsPerHour,
      stopEnergy: stop.brakeEnergy,
      mass: v.discMass,
      specificHeat: v.specificHeat,
      coolingCoefficient: v.coolingCoefficient,
      coolingArea: v.coolingArea,
      ambient: v.ambient,
    },
    d,
    'disc',
  );
  checks.push(
    makeCheck({
      id: 'temperature-steady',
      section: 'thermal',
      label: 'Mean steady bulk disc temperature ≤ pad max operating temperature',
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
        'Peak bulk disc temperature (not the rubbing surface) ≤ pad max operating temperature (μ min relied on)',
      value: Tpeak,
      limit: lining.maxOperatingTemperature,
      kind: 'max',
      dimension: 'temperature',
      base: Tamb,
      source: `${lining.source} (${lining.label}), max operating temperature; the table's short-time maximum (${(lining.maxTemperature - 273.15).toFixed(0)} °C) is where the pad is destroyed, not where μ min still holds: the pad maker's rated temperature governs (common practice)`,
      failHint:
        'Above this the friction coefficient may fall below μ min: ask the pad maker for the rated temperature, or cut the stops per hour.',
    }),
  );
  charts.push(
    temperatureChart(
      Tamb,
      dT,
      z,
      tau,
      lining.maxTemperature,
      lining.maxOperatingTemperature,
      'disc',
    ),
  );
  return { checks, charts, warnings: [], stop, peakTemperature: Tpeak };
}

/** Release force, the clamp-force range, the setting table and the field settings. */
export function caliperReleaseAndSetting(
  v: CaliperInputs,
  t: CaliperTorques,
  criteria: CriteriaSet,
  d: Derivation,
): {
  checks: CheckResult[];
  table: SheetEvaluation['tables'][number];
  fieldSettings: FieldSetting[];
} {
  const Fc = t.clampForce;
  d.section = 'release';
  const Frel = compute(
    d,
    releasedSpringForceFormula,
    { F_s: Fc, k: v.springRate, e: v.airGap, r_s: v.wearTravelRatio },
    { label: 'Spring force with the pads lifted to the air gap' },
  );
  const ratio = compute(
    d,
    forceMarginFormula,
    { F_th: v.releaseForce, F_req: Frel },
    { label: 'Release force ratio (available ÷ needed)', symbol: 'n_rel' },
  );
  const rc = criterion(criteria, 'thrusterForceRatio');
  const range = (id: string, end: 'upper' | 'lower', limit: number, kind: 'max' | 'min') =>
    makeCheck({
      id,
      section: 'setting',
      label: `Clamp force within the adjustable range (${end} end)`,
      value: Fc,
      limit,
      kind,
      dimension: 'force',
      source: 'equipment data (user input): adjustable range of the caliper springs',
    });
  const rows = [];
  for (let k = 0; k <= 10; k++) {
    const F = v.clampForceMin + ((v.clampForceMax - v.clampForceMin) * k) / 10;
    rows.push({ clampForce: F, torqueNominal: (t.nominal * F) / Fc, torqueMin: (t.min * F) / Fc });
  }
  return {
    checks: [
      makeCheck({
        id: 'release-force',
        section: 'release',
        label: 'Release force ÷ force needed ≥ required ratio',
        value: ratio,
        limit: rc.value,
        kind: 'min',
        dimension: 'dimensionless',
        source: rc.source,
      }),
      range('clamp-setting-max', 'upper', v.clampForceMax, 'max'),
      range('clamp-setting-min', 'lower', v.clampForceMin, 'min'),
    ],
    table: {
      id: 'clamp-setting',
      title: 'Clamp force setting table (new pads)',
      columns: [
        { key: 'clampForce', label: 'Clamp force per caliper', unit: 'N', dimension: 'force' },
        { key: 'torqueNominal', label: 'Torque at μ nominal', unit: 'N m', dimension: 'torque' },
        { key: 'torqueMin', label: 'Torque at μ min', unit: 'N m', dimension: 'torque' },
      ],
      rows,
    },
    fieldSettings: [
      {
        key: 'clampForce',
        label: 'Clamp force per caliper as set',
        value: Fc,
        unit: 'N',
        dimension: 'force',
      },
      {
        key: 'airGap',
        label: 'Air gap per pad when released (equal both sides)',
        value: v.airGap,
        unit: 'm',
        dimension: 'length',
      },
      {
        key: 'wear',
        label: 'Re-adjust after pad wear of',
        value: v.wear,
        unit: 'm',
        dimension: 'length',
      },
    ],
  };
}
