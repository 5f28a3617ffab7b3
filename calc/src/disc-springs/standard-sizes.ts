/**
 * Standard disc-spring sizes per DIN EN 16983 (formerly DIN 2093), as far as this project can
 * source them. Dimensions in mm, force in N at s = 0.75·h0 with E = 206 000 N/mm², ν = 0.3.
 * Series C is not listed: no source was available to the team (add it from the standard).
 * The maker's catalogue and the current standard govern; these rows are for selection and checks.
 */
export interface StandardDiscSize {
  designation: string;
  series: 'A' | 'B' | 'C';
  De: number;
  Di: number;
  t: number;
  /** Reduced thickness t′ of group 3 discs with contact flats. */
  tReduced?: number;
  l0: number;
  /** Force at s = 0.75·(l0 − t) as listed by the source, N. */
  force075: number;
  /** σOM at s = 0.75·h0 as listed, N/mm², where the source gives it. */
  sigmaOM075?: number;
  source: string;
  confidence: 'published' | 'secondary' | 'memory';
}

const CATALOGUE_1992 =
  "DIN 2093:1992 series A, as reproduced in a disc-spring maker's public catalogue (forces scatter −1.3 … +2.0 % about the formula)";
const CODE_TABLE_2006 =
  'DIN 2093 group 2, as tabulated to three significant figures in a public source-code constant table (secondary)';
const MEMORY_G3 =
  "DIN 2093 group 3 row recalled from memory: check the standard or the maker's catalogue";

const row = (
  designation: string,
  De: number,
  Di: number,
  t: number,
  l0: number,
  force075: number,
  source: string,
  confidence: StandardDiscSize['confidence'],
  extra: Partial<StandardDiscSize> = {},
): StandardDiscSize => ({
  designation,
  series: designation[0] as 'A' | 'B' | 'C',
  De,
  Di,
  t,
  l0,
  force075,
  source,
  confidence,
  ...extra,
});

export const STANDARD_DISC_SIZES: readonly StandardDiscSize[] = [
  row('A 8', 8, 4.2, 0.4, 0.6, 210, CATALOGUE_1992, 'published', { sigmaOM075: -1200 }),
  row('A 10', 10, 5.2, 0.5, 0.75, 329, CATALOGUE_1992, 'published', { sigmaOM075: -1210 }),
  row('A 12.5', 12.5, 6.2, 0.7, 1.0, 673, CATALOGUE_1992, 'published', { sigmaOM075: -1280 }),
  row('A 16', 16, 8.2, 0.9, 1.25, 1000, CATALOGUE_1992, 'published', { sigmaOM075: -1160 }),
  row('A 20', 20, 10.2, 1.1, 1.55, 1530, CATALOGUE_1992, 'published', { sigmaOM075: -1180 }),
  row('A 31.5', 31.5, 16.3, 1.75, 2.45, 3870, CODE_TABLE_2006, 'secondary'),
  row('A 40', 40, 20.4, 2.25, 3.15, 6500, CODE_TABLE_2006, 'secondary'),
  row('A 45', 45, 22.4, 2.5, 3.5, 7720, CODE_TABLE_2006, 'secondary'),
  row('A 50', 50, 25.4, 3.0, 4.1, 12000, CODE_TABLE_2006, 'secondary'),
  row('A 56', 56, 28.5, 3.0, 4.3, 11400, CODE_TABLE_2006, 'secondary'),
  row('A 63', 63, 31, 3.5, 4.9, 15000, CODE_TABLE_2006, 'secondary'),
  row('A 71', 71, 36, 4.0, 5.6, 20500, CODE_TABLE_2006, 'secondary'),
  row('A 80', 80, 41, 5.0, 6.7, 33600, CODE_TABLE_2006, 'secondary'),
  row('A 90', 90, 46, 5.0, 7.0, 31400, CODE_TABLE_2006, 'secondary'),
  row('A 100', 100, 51, 6.0, 8.2, 48000, CODE_TABLE_2006, 'secondary'),
  row('A 125', 125, 64, 8.0, 10.6, 85900, MEMORY_G3, 'memory', { tReduced: 7.5 }),
  row('A 140', 140, 72, 8.0, 11.2, 85300, MEMORY_G3, 'memory', { tReduced: 7.5 }),
  row('A 160', 160, 82, 10.0, 13.5, 138000, MEMORY_G3, 'memory', { tReduced: 9.4 }),
  row('A 200', 200, 102, 12.0, 16.2, 183000, MEMORY_G3, 'memory', { tReduced: 11.25 }),
  row('B 31.5', 31.5, 16.3, 1.25, 2.15, 1910, CODE_TABLE_2006, 'secondary'),
  row('B 40', 40, 20.4, 1.5, 2.65, 2620, CODE_TABLE_2006, 'secondary'),
  row('B 45', 45, 22.4, 1.75, 3.05, 3650, CODE_TABLE_2006, 'secondary'),
  row('B 50', 50, 25.4, 2.0, 3.4, 4760, CODE_TABLE_2006, 'secondary'),
  row('B 56', 56, 28.5, 2.0, 3.6, 4440, CODE_TABLE_2006, 'secondary'),
  row('B 63', 63, 31, 2.5, 4.25, 7190, CODE_TABLE_2006, 'secondary'),
  row('B 71', 71, 36, 2.5, 4.5, 6720, CODE_TABLE_2006, 'secondary'),
  row('B 80', 80, 41, 3.0, 5.3, 10500, CODE_TABLE_2006, 'secondary'),
  row('B 90', 90, 46, 3.5, 6.0, 14200, CODE_TABLE_2006, 'secondary'),
  row('B 100', 100, 51, 3.5, 6.3, 13100, CODE_TABLE_2006, 'secondary'),
];

/**
 * The sizes by designation without spaces, built once: a sheet looks its sizes up on every
 * evaluation, and scanning the table meant a regular-expression replace per row. The first row
 * of a designation wins, as a scan would find it.
 */
const BY_DESIGNATION = new Map<string, StandardDiscSize>();
for (const r of STANDARD_DISC_SIZES) {
  const key = r.designation.replace(/\s+/g, '');
  if (!BY_DESIGNATION.has(key)) BY_DESIGNATION.set(key, r);
}

/** Finds a standard size by designation ('A 40', 'A40' and 'a 40' all match). */
export function findStandardDisc(designation: string): StandardDiscSize | undefined {
  return BY_DESIGNATION.get(designation.replace(/\s+/g, '').toUpperCase());
}
