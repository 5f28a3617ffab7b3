import path from 'node:path';
import { fileURLToPath } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));

/**
 * `db/dist`, whether this code runs compiled (db/dist/src) or from source under vitest (db/src):
 * migrations and seeds always load as compiled JavaScript, so run `tsc -b` first.
 */
export const dbDistDir =
  path.basename(path.dirname(here)) === 'dist'
    ? path.resolve(here, '..')
    : path.resolve(here, '..', 'dist');
