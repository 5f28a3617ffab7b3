import { describe, expect, it } from 'vitest';
import { confirmationsFor, type ConfirmationRow } from './confirmations.js';

const v = (version: number, value: number) => ({
  version,
  values: [
    {
      key: 'pvLimit',
      label: 'p·v',
      value,
      unit: 'Pa m/s',
      source: 'memory',
      confidence: 'memory' as const,
    },
  ],
});
const row = (
  version: number,
  at: string,
  document = 'Lining data sheet LX-2',
): ConfirmationRow => ({
  key: 'pvLimit',
  version,
  document,
  clause: 'Table 3',
  confirmedAt: new Date(at),
  userId: '00000000-0000-4000-8000-000000000001',
  displayName: 'Kim Lund',
  initials: 'KL',
});

describe('confirmationsFor', () => {
  it('carries a confirmation to later versions while the value stays the same', () => {
    const versions = [v(1, 2e6), v(2, 2e6), v(3, 1.8e6)];
    const rows = [row(1, '2026-12-01')];
    expect(confirmationsFor(2, versions, rows)).toHaveLength(1);
    expect(confirmationsFor(3, versions, rows)).toEqual([]);
  });
  it('never applies a confirmation to an earlier version, and takes the newest', () => {
    const versions = [v(1, 2e6), v(2, 2e6)];
    const rows = [row(2, '2026-12-01', 'A'), row(2, '2026-12-02', 'B')];
    expect(confirmationsFor(1, versions, rows)).toEqual([]);
    expect(confirmationsFor(2, versions, rows)[0]!.document).toBe('B');
  });
});
