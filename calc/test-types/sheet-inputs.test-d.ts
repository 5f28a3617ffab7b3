// Compile-time checks of the typed sheet inputs: `tsc --noEmit -p calc/test-types` must pass, and
// every @ts-expect-error line must really be an error.
import type { CaliperInputs } from '../src/sheets/caliper-disc-brake-fields.js';
import type { ShoeInputs } from '../src/sheets/shoe-brake-fields.js';
import type { Length, Stiffness } from '../src/units/quantities.js';

declare const shoe: ShoeInputs;
declare const caliper: CaliperInputs;

// A quantity reads as its SI dimension: a stiffness is a Stiffness, a length a Length.
export const rate: Stiffness = shoe.springRate;
export const free: Length = shoe.springFreeLength;
// @ts-expect-error a stiffness is not a length
export const wrong: Length = shoe.springRate;

// Choices read as text, flags as booleans, plain numbers as numbers.
export const model: string = shoe.torqueModel;
export const holder: boolean = shoe.holderEnabled;
export const lever: number = shoe.leverRatio;

// @ts-expect-error a key the sheet does not declare does not compile (was num('sprngRate'))
export const typo = shoe.sprngRate;
// @ts-expect-error the caliper sheet has no drum
export const drum = caliper.drumDiameter;

// The inputs are read-only: a formula cannot overwrite what the engineer entered.
// @ts-expect-error readonly
shoe.wear = 0;
