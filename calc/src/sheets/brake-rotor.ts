/** What the brake acts on: a drum-brake card never speaks of discs, a caliper card of drums. */
export type BrakeRotor = 'drum' | 'disc';

/** The rotor of a sheet type: only the caliper disc brake acts on a disc. */
export function rotorOf(sheetTypeId: string): BrakeRotor {
  return sheetTypeId === 'caliper-disc-brake' ? 'disc' : 'drum';
}
