import { qty } from './field-builders.js';

/** The set delay is a method choice: the slowest set the thruster makes, at its coldest oil. */
const SET_DELAY_LABEL = "Brake set delay at the thruster's coldest oil (power off to full torque)";
const SET_DELAY_HELP =
  "Take the thruster's set time at the coldest oil temperature of the site from the thruster maker's data: cold oil sets slowest, and the load speeds up until the brake acts.";

/**
 * The two duty fields every sheet with a set delay shares (hoist, travel, caliper): the set delay
 * and the motor's maximum permissible speed the shaft may reach during it. Declared once here;
 * only the demo motor's rating differs between the sheets.
 */
export const setDelayFields = (motorMaxSpeedDemo: number) =>
  [
    qty('duty', 'setDelay', SET_DELAY_LABEL, 't_d', 'time', 0.3, 's', 's', {
      min: 0,
      max: 10,
      help: SET_DELAY_HELP,
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
