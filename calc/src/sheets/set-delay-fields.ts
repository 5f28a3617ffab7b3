import { qty } from './field-builders.js';

/** What releases the brake and so sets its delay: a shoe brake's thruster, a caliper's release unit. */
export type Releaser = 'thruster' | 'release unit';

/** The set delay is a method choice: the slowest set the release makes (a thruster at its coldest oil). */
const SET_DELAY: Record<Releaser, { label: string; help: string }> = {
  thruster: {
    label: "Brake set delay at the thruster's coldest oil (power off to full torque)",
    help: "Take the thruster's set time at the coldest oil temperature of the site from the thruster maker's data: cold oil sets slowest, and the load speeds up until the brake acts.",
  },
  'release unit': {
    label: 'Brake set delay of the release unit at its slowest (power off to full torque)',
    help: "Take the release unit's set time at the coldest conditions of the site from its maker's data (cold hydraulic oil sets slowest): the load speeds up until the brake acts.",
  },
};

/** Advice on a failed overspeed check: make the brake set sooner. */
export function fasterSetHint(releaser: Releaser): string {
  return releaser === 'thruster'
    ? "Shorten the set delay (thruster at its coldest oil: maker's data) or add a faster-setting brake."
    : "Shorten the set delay (release unit at its slowest: maker's data) or add a faster-setting brake.";
}

/**
 * The two duty fields every sheet with a set delay shares (hoist, travel, caliper): the set delay
 * and the motor's maximum permissible speed the shaft may reach during it. Declared once here;
 * only the demo values differ between the sheets.
 */
export const setDelayFields = (
  motorMaxSpeedDemo: number,
  releaser: Releaser = 'thruster',
  setDelayDemo = 0.3,
) =>
  [
    qty('duty', 'setDelay', SET_DELAY[releaser].label, 't_d', 'time', setDelayDemo, 's', 's', {
      min: 0,
      max: 10,
      help: SET_DELAY[releaser].help,
    }),
    qty(
      'duty',
      'motorMaxSpeed',
      "Motor maximum permissible speed (motor maker's data)",
      'n_max',
      'angularSpeed',
      motorMaxSpeedDemo,
      'rpm',
      'rpm',
      { min: 0, exclusiveMin: true, max: 20000 },
    ),
  ] as const;
