import { describe, it, expect, afterAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { existsSync, rmSync, writeFileSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
// @ts-expect-error plain ESM helper without type declarations
import { startCluster, freePortFrom } from '../lib/postgres.mjs';
// @ts-expect-error plain ESM helper without type declarations
import { ensureNpmDependencies } from '../lib/deps.mjs';

const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const clusterName = `pg-script-test-${process.pid}`;

describe('npm start', () => {
  it('refuses a taken port with a readable message and starts nothing', async () => {
    const blocker = net.createServer();
    const port: number = await freePortFrom(3950);
    await new Promise<void>((r) => blocker.listen(port, '127.0.0.1', () => r()));
    try {
      const r = spawnSync('node', ['scripts/start.mjs'], {
        cwd: projectDir,
        env: { ...process.env, PORT: String(port) },
        encoding: 'utf8',
        timeout: 30000,
      });
      expect(r.status).toBe(1);
      expect(r.stderr).toContain(`port ${port} on 127.0.0.1 is already in use`);
      expect(r.stderr).toContain('PORT=3100 npm start');
    } finally {
      blocker.close();
    }
  });

  it('skips npm ci when node_modules matches package-lock.json', async () => {
    const started = Date.now();
    await ensureNpmDependencies(projectDir);
    expect(Date.now() - started).toBeLessThan(5000);
  });
});

describe('the private PostgreSQL cluster', () => {
  let cluster: { stop(): Promise<void>; dataDir: string } | undefined;
  afterAll(async () => {
    await cluster?.stop();
    if (cluster) rmSync(cluster.dataDir, { recursive: true, force: true });
    rmSync(path.join(projectDir, '.data', `${clusterName}.secret`), { force: true });
  });

  it('is created once, then reused by a second start, and databases are created idempotently', async () => {
    const port: number = await freePortFrom(54400);
    cluster = await startCluster({ projectDir, name: clusterName, port, durable: false });
    const c = cluster as any;
    await c.ensureDatabase('idempotent_db');
    await c.ensureDatabase('idempotent_db');
    const { out } = await c.psql(
      "SELECT count(*) FROM pg_database WHERE datname = 'idempotent_db'",
    );
    expect(out.trim()).toBe('1');

    const again = Date.now();
    const second = await startCluster({ projectDir, name: clusterName, port, durable: false });
    expect(Date.now() - again).toBeLessThan(5000);
    expect(second.dataDir).toBe(c.dataDir);
    expect((await (second as any).psql('SELECT 41 + 1')).out.trim()).toBe('42');
  });

  it('removes a stale postmaster.pid left by a killed server and starts again', async () => {
    const c = cluster as any;
    await c.stop();
    const pidFile = path.join(c.dataDir, 'postmaster.pid');
    // A pid that is certainly not a running postgres: this test process's parent is node, not postgres.
    writeFileSync(pidFile, `${process.pid}\n${c.dataDir}\n`);
    const restarted = await startCluster({
      projectDir,
      name: clusterName,
      port: c.port,
      durable: false,
    });
    expect(existsSync(pidFile)).toBe(true);
    expect((await (restarted as any).psql('SELECT 1')).out.trim()).toBe('1');
  });
});
