import type { BrakeRotor } from '../core/types.js';

/** The rotor of a sheet type: only the caliper disc brake acts on a disc. */
export function rotorOf(sheetTypeId: string): BrakeRotor {
  return sheetTypeId === 'caliper-disc-brake' ? 'disc' : 'drum';
}
