import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { CORE_VERSION } from './calc-api.js';
import { describe, expect, it } from 'vitest';
import { ALL_CASES } from './all-cases.js';
import { checkCase } from './case.js';
import { renderReport } from './report.js';

describe('verification report', () => {
  it('writes docs/verification-report.md listing every case', () => {
    const outcomes = ALL_CASES.map(checkCase);
    const md = renderReport(outcomes, CORE_VERSION);
    const target = fileURLToPath(new URL('../docs/verification-report.md', import.meta.url));
    writeFileSync(target, md + '\n');
    for (const c of ALL_CASES) expect(md).toContain(`### ${c.id} `);
  });
});
