import type { VerificationCase } from './case.js';

/** Every case module under cases/ (each exports `verificationCase`), sorted by family then id. */
const modules = import.meta.glob<{ verificationCase: VerificationCase }>('./cases/**/*.ts', {
  eager: true,
});

export const ALL_CASES: VerificationCase[] = Object.values(modules)
  .map((m) => m.verificationCase)
  .filter((c): c is VerificationCase => c !== undefined)
  .sort((a, b) =>
    a.family === b.family ? a.id.localeCompare(b.id) : a.family.localeCompare(b.family),
  );
