// Compile-time checks: `tsc --noEmit -p calc/test-types` must pass; every @ts-expect-error line
// must really be an error, otherwise tsc reports the unused directive.
import {
  force,
  length,
  torque,
  type Force,
  type Length,
  type Torque,
} from '../src/units/quantities.js';
import { parseQuantity } from '../src/units/parse.js';

function leverTorque(f: Force, r: Length): Torque {
  return torque(f * r);
}

const f = force(1000);
const r = length(0.2);
leverTorque(f, r);

// @ts-expect-error a length is not a force
leverTorque(r, r);
// @ts-expect-error a plain number carries no dimension
leverTorque(1000, r);
// @ts-expect-error a torque is not a length
leverTorque(f, torque(5));

const parsed = parseQuantity('12 kN', 'force');
leverTorque(parsed, r);
// @ts-expect-error parsed as a length, cannot be used as a force
leverTorque(parseQuantity('300 mm', 'length'), r);

// Branded values still read as numbers.
const plain: number = f * 2;
void plain;
