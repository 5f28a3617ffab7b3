import type { RevisionState } from '@holdfast/shared';

const LABELS: Record<RevisionState, string> = {
  draft: 'Draft',
  in_check: 'In check',
  returned: 'Returned',
  approved: 'Approved',
  superseded: 'Superseded',
};

/**
 * A revision state in words, the one wording for badges, lists, CSV and the /verify page. A state
 * this build does not know (a newer server) prints as the server spells it, without underscores.
 */
export function stateLabel(state: RevisionState | (string & {})): string {
  return LABELS[state as RevisionState] ?? state.replaceAll('_', ' ');
}
