import type { Dimension } from '../core/types.js';

declare const dimensionBrand: unique symbol;

/**
 * A number in SI base units, branded with its physical dimension so that passing a force where a
 * length is wanted fails to compile. Arithmetic on branded values gives plain numbers; formula
 * functions brand their results again.
 */
export type Q<D extends Dimension> = number & { readonly [dimensionBrand]: D };

export type Length = Q<'length'>;
export type Force = Q<'force'>;
export type Torque = Q<'torque'>;
export type Power = Q<'power'>;
export type Speed = Q<'speed'>;
export type AngularSpeed = Q<'angularSpeed'>;
/** rad/s². */
export type AngularAcceleration = Q<'angularAcceleration'>;
export type Mass = Q<'mass'>;
export type Inertia = Q<'inertia'>;
export type Pressure = Q<'pressure'>;
export type PV = Q<'pv'>;
export type Energy = Q<'energy'>;
/** Absolute temperature in kelvin. */
export type Temperature = Q<'temperature'>;
export type TemperatureDifference = Q<'temperatureDifference'>;
export type Time = Q<'time'>;
/** Plane angle in radians. */
export type Angle = Q<'angle'>;
export type Acceleration = Q<'acceleration'>;
/** Spring rate in N/m. */
export type Stiffness = Q<'stiffness'>;
export type SpecificHeat = Q<'specificHeat'>;
export type HeatTransferCoefficient = Q<'heatTransferCoefficient'>;
export type Area = Q<'area'>;
/** Events per second (stops per hour are converted to 1/s). */
export type Frequency = Q<'frequency'>;
export type Ratio = Q<'dimensionless'>;

/** Brands an SI value with a dimension. Use at the edges, where the unit is known to be SI. */
export function si<D extends Dimension>(value: number, _dimension: D): Q<D> {
  return value as Q<D>;
}

export const length = (m: number): Length => m as Length;
export const force = (n: number): Force => n as Force;
export const torque = (nm: number): Torque => nm as Torque;
export const power = (w: number): Power => w as Power;
export const speed = (ms: number): Speed => ms as Speed;
export const angularSpeed = (rads: number): AngularSpeed => rads as AngularSpeed;
export const angularAcceleration = (rads2: number): AngularAcceleration =>
  rads2 as AngularAcceleration;
export const mass = (kg: number): Mass => kg as Mass;
export const inertia = (kgm2: number): Inertia => kgm2 as Inertia;
export const pressure = (pa: number): Pressure => pa as Pressure;
export const pv = (paMs: number): PV => paMs as PV;
export const energy = (j: number): Energy => j as Energy;
export const temperature = (k: number): Temperature => k as Temperature;
export const temperatureDifference = (k: number): TemperatureDifference =>
  k as TemperatureDifference;
export const time = (s: number): Time => s as Time;
export const angle = (rad: number): Angle => rad as Angle;
export const acceleration = (ms2: number): Acceleration => ms2 as Acceleration;
export const stiffness = (nPerM: number): Stiffness => nPerM as Stiffness;
export const specificHeat = (jPerKgK: number): SpecificHeat => jPerKgK as SpecificHeat;
export const heatTransferCoefficient = (wPerM2K: number): HeatTransferCoefficient =>
  wPerM2K as HeatTransferCoefficient;
export const area = (m2: number): Area => m2 as Area;
export const frequency = (perS: number): Frequency => perS as Frequency;
export const ratio = (x: number): Ratio => x as Ratio;

/** Degrees to an Angle in radians. */
export const degrees = (deg: number): Angle => ((deg * Math.PI) / 180) as Angle;
/** rpm to an AngularSpeed in rad/s. */
export const rpm = (n: number): AngularSpeed => ((n * Math.PI) / 30) as AngularSpeed;
/** °C to an absolute Temperature in K. */
export const celsius = (c: number): Temperature => (c + 273.15) as Temperature;
