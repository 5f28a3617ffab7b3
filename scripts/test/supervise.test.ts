import { describe, it, expect, afterEach } from 'vitest';
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
// @ts-expect-error plain ESM helper without type declarations
import { supervise } from '../lib/supervise.mjs';
// @ts-expect-error plain ESM helper without type declarations
import { freePortFrom } from '../lib/postgres.mjs';

// A stand-in for the server: answers /api/health, and can be killed like the real one.
const dir = mkdtempSync(path.join(tmpdir(), 'holdfast-supervise-'));
const fakeServer = path.join(dir, 'server.mjs');
writeFileSync(
  fakeServer,
  `import http from 'node:http';
   http.createServer((q, r) => r.end('ok')).listen(Number(process.argv[2]), '127.0.0.1');`,
);

async function startFake(port: number): Promise<{ child: ChildProcess }> {
  const child = spawn(process.execPath, [fakeServer, String(port)], { stdio: 'ignore' });
  for (let i = 0; i < 100; i++) {
    if (child.exitCode !== null) throw new Error('fake server died');
    const ok = await fetch(`http://127.0.0.1:${port}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (ok) return { child };
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('fake server did not answer');
}

const until = async (what: () => boolean, ms: number) => {
  const end = Date.now() + ms;
  while (!what()) {
    if (Date.now() > end) throw new Error('timed out');
    await new Promise((r) => setTimeout(r, 20));
  }
};

describe('the server supervisor (npm start)', () => {
  let sup: { stop(): { child: ChildProcess } | null } | undefined;
  afterEach(() => sup?.stop()?.child.kill('SIGKILL'));

  it('restarts a server that dies, says so, and keeps doing it', async () => {
    const port: number = await freePortFrom(3970);
    const lines: string[] = [];
    const s = supervise(() => startFake(port), {
      minDelayMs: 100,
      log: (l: string) => lines.push(l),
    });
    sup = s;
    s.adopt(await startFake(port));
    for (let round = 1; round <= 2; round++) {
      const before = s.current().child;
      before.kill('SIGKILL');
      await until(() => s.current() !== null && s.current().child !== before, 5000);
      expect(s.restarts()).toBe(round);
      expect((await fetch(`http://127.0.0.1:${port}/api/health`)).ok).toBe(true);
    }
    expect(lines.filter((l) => /stopped unexpectedly \(signal SIGKILL\)/.test(l))).toHaveLength(2);
    expect(lines.join('\n')).toMatch(/PostgreSQL keeps running/);
    expect(lines.filter((l) => /the server is back/.test(l))).toHaveLength(2);
  });

  it('backs off while starts keep failing, then recovers', async () => {
    const port: number = await freePortFrom(3980);
    const lines: string[] = [];
    const attempts: number[] = [];
    let failures = 3;
    const s = supervise(
      async () => {
        attempts.push(Date.now());
        if (failures-- > 0) throw new Error('cannot start yet');
        return startFake(port);
      },
      { minDelayMs: 100, maxDelayMs: 1000, log: (l: string) => lines.push(l) },
    );
    sup = s;
    s.adopt(await startFake(port));
    s.current().child.kill('SIGKILL');
    await until(() => s.restarts() === 1, 8000);
    expect(attempts).toHaveLength(4);
    const gaps = attempts.slice(1).map((t, i) => t - attempts[i]!);
    // 200, 400, 800 ms: each wait doubles (timers may run late, never early).
    expect(gaps[0]).toBeGreaterThanOrEqual(190);
    expect(gaps[1]).toBeGreaterThanOrEqual(390);
    expect(gaps[2]).toBeGreaterThanOrEqual(790);
    expect(lines.filter((l) => /restart failed \(cannot start yet\)/.test(l))).toHaveLength(3);
  });
});
