import { describe, expect, it } from 'vitest';
import { SHEET_TYPE_IDS } from '../ids.js';
import { rotorOf } from './brake-rotor.js';

describe('rotorOf', () => {
  it('only the caliper disc brake acts on a disc; every other sheet type on a drum', () => {
    for (const id of SHEET_TYPE_IDS) {
      expect(rotorOf(id), id).toBe(id === 'caliper-disc-brake' ? 'disc' : 'drum');
    }
    expect(SHEET_TYPE_IDS).toContain('caliper-disc-brake');
  });
});
