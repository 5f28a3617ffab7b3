import pg from 'pg';

const alive = (pid: number) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

/**
 * A database of its own for this vitest worker: `<base>_<run pid>_w<pool id>`, created on first
 * use in the same cluster as `baseUrl`. Vitest runs files of different projects side by side
 * even with fileParallelism off, and every server suite empties tables between tests, so sharing
 * one database would let suites wipe each other's rows. Databases left by finished runs are
 * dropped here. Set HOLDFAST_TEST_SHARED_DB=1 to use `baseUrl` as is.
 */
export async function workerDatabaseUrl(baseUrl: string): Promise<string> {
  if (process.env.HOLDFAST_TEST_SHARED_DB === '1') return baseUrl;
  const url = new URL(baseUrl);
  const baseName = decodeURIComponent(url.pathname.slice(1));
  const runPid = process.ppid;
  const name = `${baseName}_${runPid}_w${process.env.VITEST_POOL_ID ?? '1'}`.slice(0, 63);
  const client = new pg.Client({ connectionString: baseUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ datname: string }>(
      `select datname from pg_database where datname like $1`,
      [`${baseName.replace(/_/g, '\\_')}\\_%\\_w%`],
    );
    for (const { datname } of rows) {
      const pid = Number(/_(\d+)_w\d+$/.exec(datname)?.[1]);
      if (pid && pid !== runPid && !alive(pid)) {
        await client
          .query(`drop database if exists "${datname}" with (force)`)
          .catch(() => undefined);
      }
    }
    await client.query(`create database "${name}"`).catch((error: { code?: string }) => {
      if (error.code !== '42P04') throw error; // already exists: this worker made it earlier
    });
  } finally {
    await client.end();
  }
  url.pathname = `/${name}`;
  return url.toString();
}
