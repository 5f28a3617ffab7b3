// Keeps one server process running: when it dies it is started again, with back-off, and the
// operator is told. PostgreSQL is never touched here: a crashed server is no reason to stop the
// database (other instances, or the next start, still need it).
import { step } from './log.mjs';

/**
 * Supervise a child started by `start()` (which resolves to `{ child }` once it is serving, or
 * rejects). After an unexpected exit the next start waits `minDelayMs`, doubling up to
 * `maxDelayMs` while starts keep failing or the server keeps dying young; a server that stayed up
 * for `stableMs` resets the delay. Returns `{ current(), stop(), restarts() }`.
 */
export function supervise(
  start,
  { minDelayMs = 1000, maxDelayMs = 30000, stableMs = 60000, log = step } = {},
) {
  let stopping = false;
  let current = null;
  let restarts = 0;
  let delay = minDelayMs;
  let timer = null;

  const watch = (server) => {
    current = server;
    const startedAt = Date.now();
    server.child.once('exit', (code, signal) => {
      if (stopping) return;
      current = null;
      if (Date.now() - startedAt >= stableMs) delay = minDelayMs;
      const why = signal ? `signal ${signal}` : `exit ${code}`;
      log(
        `the server stopped unexpectedly (${why}); PostgreSQL keeps running; restarting in ${(delay / 1000).toFixed(1)} s`,
      );
      schedule();
    });
  };

  const schedule = () => {
    const wait = delay;
    delay = Math.min(delay * 2, maxDelayMs);
    timer = setTimeout(async () => {
      timer = null;
      if (stopping) return;
      try {
        const server = await start();
        if (stopping) {
          server.child.kill('SIGTERM');
          return;
        }
        restarts++;
        log(`the server is back (restart ${restarts})`);
        watch(server);
      } catch (e) {
        const first = String(e?.message ?? e).split('\n')[0];
        log(
          `restart failed (${first}); trying again in ${(Math.min(delay, maxDelayMs) / 1000).toFixed(1)} s`,
        );
        schedule();
      }
    }, wait);
  };

  return {
    /** Hand over the first, already running server. */
    adopt: (server) => watch(server),
    current: () => current,
    restarts: () => restarts,
    stop: () => {
      stopping = true;
      if (timer) clearTimeout(timer);
      return current;
    },
  };
}
