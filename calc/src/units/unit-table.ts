import type { Dimension } from '../core/types.js';

/** A unit the UI may offer for a dimension. `unit` is the text the parser accepts (mathjs syntax). */
export interface UnitOption {
  unit: string;
  /** Printed form, e.g. 'N·m', 'kg·m²', '°C'. */
  label: string;
  system: 'SI' | 'US' | 'both';
  /** convert-units code when that library knows the unit; otherwise mathjs converts. */
  cu?: string;
  /** Fixed factor to SI when neither library handles the unit (compound units with °F). */
  factor?: number;
}

export interface DimensionInfo {
  /** SI unit of stored values (mathjs text) and its printed label. */
  siUnit: string;
  siLabel: string;
  /** Default display units for SI and US customary presentation. */
  displaySI: string;
  displayUS: string;
  units: UnitOption[];
}

const u = (
  unit: string,
  label: string,
  system: UnitOption['system'],
  extra: Partial<UnitOption> = {},
): UnitOption => ({ unit, label, system, ...extra });

/** Units per dimension. The first SI entry of each list is the SI storage unit. */
export const DIMENSIONS: Record<Dimension, DimensionInfo> = {
  length: {
    siUnit: 'm',
    siLabel: 'm',
    displaySI: 'mm',
    displayUS: 'in',
    units: [
      u('m', 'm', 'SI', { cu: 'm' }),
      u('mm', 'mm', 'SI', { cu: 'mm' }),
      u('cm', 'cm', 'SI', { cu: 'cm' }),
      u('in', 'in', 'US', { cu: 'in' }),
      u('ft', 'ft', 'US', { cu: 'ft' }),
    ],
  },
  force: {
    siUnit: 'N',
    siLabel: 'N',
    displaySI: 'N',
    displayUS: 'lbf',
    units: [u('N', 'N', 'SI'), u('kN', 'kN', 'SI'), u('lbf', 'lbf', 'US'), u('kip', 'kip', 'US')],
  },
  torque: {
    siUnit: 'N m',
    siLabel: 'N·m',
    displaySI: 'N m',
    displayUS: 'lbf ft',
    units: [
      u('N m', 'N·m', 'SI'),
      u('kN m', 'kN·m', 'SI'),
      u('lbf ft', 'lbf·ft', 'US'),
      u('lbf in', 'lbf·in', 'US'),
    ],
  },
  power: {
    siUnit: 'W',
    siLabel: 'W',
    displaySI: 'kW',
    displayUS: 'hp',
    units: [u('W', 'W', 'SI', { cu: 'W' }), u('kW', 'kW', 'SI', { cu: 'kW' }), u('hp', 'hp', 'US')],
  },
  speed: {
    siUnit: 'm/s',
    siLabel: 'm/s',
    displaySI: 'm/s',
    displayUS: 'ft/min',
    units: [
      u('m/s', 'm/s', 'SI', { cu: 'm/s' }),
      u('m/min', 'm/min', 'SI'),
      u('ft/min', 'ft/min', 'US'),
      u('ft/s', 'ft/s', 'US', { cu: 'ft/s' }),
    ],
  },
  angularSpeed: {
    siUnit: 'rad/s',
    siLabel: 'rad/s',
    displaySI: 'rpm',
    displayUS: 'rpm',
    units: [u('rad/s', 'rad/s', 'SI', { cu: 'rad/s' }), u('rpm', 'rpm', 'both', { cu: 'rpm' })],
  },
  angularAcceleration: {
    siUnit: 'rad/s^2',
    siLabel: 'rad/s²',
    displaySI: 'rad/s^2',
    displayUS: 'rad/s^2',
    units: [u('rad/s^2', 'rad/s²', 'both')],
  },
  mass: {
    siUnit: 'kg',
    siLabel: 'kg',
    displaySI: 'kg',
    displayUS: 'lb',
    units: [
      u('kg', 'kg', 'SI', { cu: 'kg' }),
      u('tonne', 't', 'SI', { cu: 't' }),
      u('lb', 'lb', 'US', { cu: 'lb' }),
    ],
  },
  inertia: {
    siUnit: 'kg m^2',
    siLabel: 'kg·m²',
    displaySI: 'kg m^2',
    displayUS: 'lb ft^2',
    units: [u('kg m^2', 'kg·m²', 'SI'), u('lb ft^2', 'lb·ft²', 'US')],
  },
  pressure: {
    siUnit: 'Pa',
    siLabel: 'Pa',
    displaySI: 'MPa',
    displayUS: 'psi',
    units: [
      u('Pa', 'Pa', 'SI', { cu: 'Pa' }),
      u('kPa', 'kPa', 'SI', { cu: 'kPa' }),
      u('MPa', 'MPa', 'SI', { cu: 'MPa' }),
      u('N/mm^2', 'N/mm²', 'SI'),
      u('bar', 'bar', 'SI', { cu: 'bar' }),
      u('psi', 'psi', 'US', { cu: 'psi' }),
    ],
  },
  pv: {
    siUnit: 'Pa m/s',
    siLabel: 'Pa·m/s',
    displaySI: 'MPa m/s',
    displayUS: 'psi ft/min',
    units: [u('MPa m/s', 'MPa·m/s', 'SI'), u('psi ft/min', 'psi·ft/min', 'US')],
  },
  energy: {
    siUnit: 'J',
    siLabel: 'J',
    displaySI: 'kJ',
    displayUS: 'ft lbf',
    units: [
      u('J', 'J', 'SI', { cu: 'J' }),
      u('kJ', 'kJ', 'SI', { cu: 'kJ' }),
      u('MJ', 'MJ', 'SI'),
      u('ft lbf', 'ft·lbf', 'US'),
    ],
  },
  temperature: {
    siUnit: 'K',
    siLabel: 'K',
    displaySI: 'degC',
    displayUS: 'degF',
    units: [
      u('degC', '°C', 'SI', { cu: 'C' }),
      u('K', 'K', 'SI', { cu: 'K' }),
      u('degF', '°F', 'US', { cu: 'F' }),
    ],
  },
  temperatureDifference: {
    siUnit: 'K',
    siLabel: 'K',
    displaySI: 'K',
    displayUS: 'degF',
    units: [
      u('K', 'K', 'SI', { factor: 1 }),
      u('degC', '°C', 'SI', { factor: 1 }),
      u('degF', '°F', 'US', { factor: 5 / 9 }),
    ],
  },
  time: {
    siUnit: 's',
    siLabel: 's',
    displaySI: 's',
    displayUS: 's',
    units: [
      u('s', 's', 'both', { cu: 's' }),
      u('ms', 'ms', 'both', { cu: 'ms' }),
      u('min', 'min', 'both', { cu: 'min' }),
      u('h', 'h', 'both', { cu: 'h' }),
    ],
  },
  angle: {
    siUnit: 'rad',
    siLabel: 'rad',
    displaySI: 'deg',
    displayUS: 'deg',
    units: [u('deg', '°', 'both', { cu: 'deg' }), u('rad', 'rad', 'both', { cu: 'rad' })],
  },
  acceleration: {
    siUnit: 'm/s^2',
    siLabel: 'm/s²',
    displaySI: 'm/s^2',
    displayUS: 'ft/s^2',
    units: [u('m/s^2', 'm/s²', 'SI'), u('ft/s^2', 'ft/s²', 'US')],
  },
  stiffness: {
    siUnit: 'N/m',
    siLabel: 'N/m',
    displaySI: 'N/mm',
    displayUS: 'lbf/in',
    units: [
      u('N/mm', 'N/mm', 'SI'),
      u('N/m', 'N/m', 'SI'),
      u('kN/mm', 'kN/mm', 'SI'),
      u('lbf/in', 'lbf/in', 'US'),
    ],
  },
  specificHeat: {
    siUnit: 'J/(kg K)',
    siLabel: 'J/(kg·K)',
    displaySI: 'J/(kg K)',
    displayUS: 'BTU/(lb degF)',
    // 1 BTU(IT)/(lb·°F) = 4186.8 J/(kg·K) by definition of the IT calorie and BTU.
    units: [
      u('J/(kg K)', 'J/(kg·K)', 'SI', { factor: 1 }),
      u('BTU/(lb degF)', 'BTU/(lb·°F)', 'US', { factor: 4186.8 }),
    ],
  },
  heatTransferCoefficient: {
    siUnit: 'W/(m^2 K)',
    siLabel: 'W/(m²·K)',
    displaySI: 'W/(m^2 K)',
    displayUS: 'BTU/(h ft^2 degF)',
    units: [
      u('W/(m^2 K)', 'W/(m²·K)', 'SI', { factor: 1 }),
      u('BTU/(h ft^2 degF)', 'BTU/(h·ft²·°F)', 'US', { factor: 5.678263341 }),
    ],
  },
  area: {
    siUnit: 'm^2',
    siLabel: 'm²',
    displaySI: 'm^2',
    displayUS: 'ft^2',
    units: [
      u('m^2', 'm²', 'SI', { cu: 'm2' }),
      u('mm^2', 'mm²', 'SI', { cu: 'mm2' }),
      u('cm^2', 'cm²', 'SI', { cu: 'cm2' }),
      u('in^2', 'in²', 'US', { cu: 'in2' }),
      u('ft^2', 'ft²', 'US', { cu: 'ft2' }),
    ],
  },
  frequency: {
    siUnit: '1/s',
    siLabel: '1/s',
    displaySI: '1/h',
    displayUS: '1/h',
    units: [
      // Labels say what is counted: the only frequency on a sheet is how often the brake stops.
      u('1/h', 'stops/h', 'both', { factor: 1 / 3600 }),
      u('1/min', 'stops/min', 'both', { factor: 1 / 60 }),
      u('1/s', 'stops/s', 'both', { factor: 1 }),
    ],
  },
  dimensionless: {
    siUnit: '',
    siLabel: '',
    displaySI: '',
    displayUS: '',
    units: [u('', '', 'both', { factor: 1 }), u('%', '%', 'both', { factor: 0.01 })],
  },
};

/** Spellings people type, mapped to the parser's unit text (applied after symbol normalisation). */
export const UNIT_ALIASES: Partial<Record<Dimension, Record<string, string>>> = {
  torque: {
    Nm: 'N m',
    kNm: 'kN m',
    'lb ft': 'lbf ft',
    'lb-ft': 'lbf ft',
    'ft-lb': 'lbf ft',
    'ft lb': 'lbf ft',
    'ft lbf': 'lbf ft',
    'lbf-ft': 'lbf ft',
    'lb in': 'lbf in',
    'lb-in': 'lbf in',
    'in lb': 'lbf in',
    'in-lb': 'lbf in',
  },
  energy: {
    'ft-lb': 'ft lbf',
    'ft lb': 'ft lbf',
    'lbf ft': 'ft lbf',
    'ft-lbf': 'ft lbf',
    Nm: 'J',
    'N m': 'J',
  },
  force: { lb: 'lbf', daN: 'daN' },
  inertia: { 'lb ft2': 'lb ft^2', 'kg m2': 'kg m^2', kgm2: 'kg m^2' },
  mass: { t: 'tonne' },
  speed: { fpm: 'ft/min', 'ft/mn': 'ft/min' },
  angularSpeed: { 'r/min': 'rpm', 'min^-1': 'rpm', '1/min': 'rpm' },
  frequency: {
    '/h': '1/h',
    'per h': '1/h',
    'per hour': '1/h',
    'h^-1': '1/h',
    '1/hr': '1/h',
    'stops/h': '1/h',
    'stops per hour': '1/h',
    'stops/min': '1/min',
    'stops/s': '1/s',
  },
  pv: { 'MPa*m/s': 'MPa m/s', 'psi*ft/min': 'psi ft/min', 'psi fpm': 'psi ft/min' },
  temperatureDifference: {
    'delta degC': 'degC',
    'delta degF': 'degF',
    deltaF: 'degF',
    deltaC: 'degC',
  },
  heatTransferCoefficient: { 'W/m^2K': 'W/(m^2 K)', 'W/(m^2*K)': 'W/(m^2 K)' },
  specificHeat: { 'J/kgK': 'J/(kg K)', 'J/(kg*K)': 'J/(kg K)' },
};
