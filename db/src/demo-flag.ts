/**
 * Whether the demo (demo users with the published password, the invented plant) is wanted:
 * HOLDFAST_DEMO=1 asks for it, HOLDFAST_DEMO=0 refuses it; unset, it is on everywhere except
 * NODE_ENV=production. `npm start` sets HOLDFAST_DEMO=1 unless told otherwise.
 */
export function demoRequested(env: NodeJS.ProcessEnv = process.env): boolean {
  const flag = (env.HOLDFAST_DEMO ?? '').trim().toLowerCase();
  if (['1', 'true', 'yes'].includes(flag)) return true;
  if (['0', 'false', 'no'].includes(flag)) return false;
  return env.NODE_ENV !== 'production';
}
