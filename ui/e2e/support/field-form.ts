import { apiClientAs } from './api';

interface RegisterAnswer {
  sites: {
    machines: {
      positions: { id: string; tag: string; inForce: { revisionId: string }[] }[];
    }[];
  }[];
}

/** The field form the API gives a technician for an approved revision (what the tests read). */
export interface FieldFormAnswer {
  targets: { settingKey: string; label: string; tolerance: unknown }[];
  checks: { key: string; label: string; hasValue: boolean }[];
}

/**
 * The first demo brake position with a revision in force, and that revision's field form, as the
 * technician sees them through the API: where the field-record browser tests record their work.
 */
export async function firstPositionInForce(
  baseUrl: string,
): Promise<{ positionId: string; revisionId: string; form: FieldFormAnswer }> {
  const call = await apiClientAs(baseUrl, 'technician');
  const register = await call<RegisterAnswer>('GET', '/register');
  const position = register.sites
    .flatMap((s) => s.machines.flatMap((m) => m.positions))
    .find((p) => p.inForce.length > 0)!;
  const revisionId = position.inForce[0]!.revisionId;
  const form = await call<FieldFormAnswer>('GET', `/revisions/${revisionId}/field-form`);
  return { positionId: position.id, revisionId, form };
}
