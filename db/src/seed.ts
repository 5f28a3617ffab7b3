import { promises as fs } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Kysely } from 'kysely';
import type { DB } from './database.js';
import { demoRequested } from './demo-flag.js';
import { dbDistDir } from './dist-dir.js';

/**
 * Seed modules: every compiled `db/dist/seeds/*.js` exporting `seed(db: Kysely<DB>)`, run in
 * file-name order (timestamp prefix). Each one must be idempotent: `npm start` runs them on every
 * start. They need nothing but the database (the demo users); the demo scenario, which needs the
 * server's rules, is seeded by the server afterwards (server/src/demo/).
 */
export const seedFolder = path.join(dbDistDir, 'seeds');
/** Where the seeds' sources are: `tsc -b` never deletes the output of a source removed since. */
const sourceFolder = path.join(path.dirname(dbDistDir), 'seeds');

interface SeedModule {
  seed: (db: Kysely<DB>) => Promise<void>;
}

export async function listSeeds(): Promise<string[]> {
  const files = await fs.readdir(seedFolder).catch(() => [] as string[]);
  const sources = new Set(await fs.readdir(sourceFolder).catch(() => [] as string[]));
  return files.filter((f) => f.endsWith('.js') && sources.has(`${f.slice(0, -3)}.ts`)).sort();
}

/** Demo seeds (`*_demo_*`) publish a password: they run only when the demo is asked for. */
const isDemoSeed = (name: string) => /_demo_/.test(name);

/** Run every seed module in order (demo ones only with `demo`); returns their names. */
export async function seed(db: Kysely<DB>, demo = demoRequested()): Promise<string[]> {
  const names = (await listSeeds()).filter((n) => demo || !isDemoSeed(n));
  for (const name of names) {
    const mod = (await import(
      pathToFileURL(path.join(seedFolder, name)).href
    )) as Partial<SeedModule>;
    if (typeof mod.seed !== 'function') throw new Error(`seed file ${name} exports no seed(db)`);
    await mod.seed(db);
  }
  return names.map((n) => n.slice(0, -3));
}
