import { useSession } from '../../../lib/session';
import type { NumberFormat } from '../utils/number-entry';

/** The signed-in user's decimal separator for typing numbers (a profile setting). */
export function useNumberFormat(): NumberFormat {
  return useSession().user?.numberFormat ?? 'point';
}
