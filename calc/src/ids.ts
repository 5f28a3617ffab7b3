/**
 * The identifiers calc's public types are built from, in a module with no dependencies so that
 * shared/ (and through it the UI's first screen) can derive its API schemas from them without
 * loading the calculation core.
 */

/** Sheet types of this core version, in the order a UI lists them (the registry follows it). */
export const SHEET_TYPE_IDS = [
  'hoist-shoe-brake',
  'travel-shoe-brake',
  'drive-shoe-brake',
  'caliper-disc-brake',
  'disc-spring-stack',
] as const;

/** Id of a sheet type of this core version. */
export type SheetTypeId = (typeof SHEET_TYPE_IDS)[number];

/** Physical dimensions of fields and results; each decides which units are accepted and offered. */
export const DIMENSION_IDS = [
  'length',
  'force',
  'torque',
  'power',
  'speed',
  'angularSpeed',
  'angularAcceleration',
  'mass',
  'inertia',
  'pressure',
  'pv',
  'energy',
  'temperature',
  'temperatureDifference',
  'time',
  'angle',
  'acceleration',
  'stiffness',
  'specificHeat',
  'heatTransferCoefficient',
  'area',
  'frequency',
  'dimensionless',
] as const;

/** How far a criteria value or a field tolerance can be trusted, best first. */
export const CONFIDENCE_LEVELS = ['published', 'secondary', 'common practice', 'memory'] as const;

/** The blocks of the field setting card, in print order. */
export const FIELD_CARD_GROUPS = ['spring', 'thruster', 'clearance', 'discStack', 'other'] as const;
