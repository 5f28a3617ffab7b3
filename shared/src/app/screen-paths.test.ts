import { describe, expect, it } from 'vitest';
import { positionFieldPath, revisionPath, screenRoutes, screenUrl } from './screen-paths.js';

describe('screen paths', () => {
  it('fill the UI’s route patterns', () => {
    expect(screenRoutes.positionField).toBe('positions/:positionId/field');
    expect(positionFieldPath('p-1')).toBe('/positions/p-1/field');
    expect(revisionPath('s 1', 'r/2')).toBe('/sheets/s%201/revisions/r%2F2');
  });

  it('join the public URL with or without its trailing slash', () => {
    expect(screenUrl('https://holdfast.example/', '/positions/p/field')).toBe(
      'https://holdfast.example/positions/p/field',
    );
    expect(screenUrl('https://holdfast.example', '/x')).toBe('https://holdfast.example/x');
  });
});
