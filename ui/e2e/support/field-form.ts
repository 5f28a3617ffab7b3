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

/** The demo's brake position with a wear history (six field records over four months). */
const WEAR_HISTORY_TAG = 'MH-B1';

/**
 * The demo brake position with a wear history and a revision in force, and that revision's field
 * form, as the technician sees them through the API: where the field-record browser tests record
 * their work. Chosen by its tag, not as the first position in force: other browser tests approve
 * sheets on other positions, and in whichever order the files run the choice must not move.
 */
export async function demoPositionInForce(
  baseUrl: string,
): Promise<{ positionId: string; revisionId: string; form: FieldFormAnswer }> {
  const call = await apiClientAs(baseUrl, 'technician');
  const register = await call<RegisterAnswer>('GET', '/register');
  const position = register.sites
    .flatMap((s) => s.machines.flatMap((m) => m.positions))
    .find((p) => p.tag === WEAR_HISTORY_TAG && p.inForce.length > 0);
  if (!position) throw new Error(`the demo position ${WEAR_HISTORY_TAG} has no revision in force`);
  const revisionId = position.inForce[0]!.revisionId;
  const form = await call<FieldFormAnswer>('GET', `/revisions/${revisionId}/field-form`);
  return { positionId: position.id, revisionId, form };
}
