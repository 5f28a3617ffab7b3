import { describe, expect, it } from 'vitest';
import { queueSections } from './queue-sections';

const titles = (role: Parameters<typeof queueSections>[0]) =>
  queueSections(role).map((s) => s.title);

describe('work queue sections per role', () => {
  it('gives a fitter the approvals to set brakes to, not to file', () => {
    expect(titles('technician')).toEqual(['Newly approved: brakes to set']);
    expect(titles('viewer')).toEqual(['Newly approved: print into the safety file']);
  });

  it('puts a checker’s checks first and gives an administrator no sheet lists', () => {
    expect(queueSections('checker')[0]?.list).toBe('awaitingMyCheck');
    expect(queueSections('engineer').map((s) => s.list)).not.toContain('awaitingMyCheck');
    expect(queueSections('admin')).toEqual([]);
  });
});
