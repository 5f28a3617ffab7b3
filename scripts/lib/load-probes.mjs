// Measuring helpers for `npm run bench:load`: autocannon runs, and the print-under-load probe.
import autocannon from 'autocannon';

/** A percentile of sorted numbers (nearest rank). */
export function percentile(sorted, p) {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

export async function signIn(baseUrl, email, password) {
  const res = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`sign-in as ${email}: ${res.status} ${await res.text()}`);
  return (await res.json()).accessToken;
}

export async function getJson(baseUrl, path, token) {
  const res = await fetch(baseUrl + path, {
    headers: token ? { authorization: `Bearer ${token}` } : {},
  });
  if (!res.ok) throw new Error(`GET ${path}: ${res.status} ${await res.text()}`);
  return res.json();
}

/** One autocannon run; throws when any answer was not 2xx, so a figure is never of errors. */
export async function cannon({ name, url, token, connections, seconds }) {
  const r = await autocannon({
    url,
    connections,
    duration: seconds,
    headers: token ? { authorization: `Bearer ${token}` } : {},
  });
  if (r.non2xx > 0 || r.errors > 0 || r.timeouts > 0) {
    throw new Error(`${name}: ${r.non2xx} non-2xx, ${r.errors} errors, ${r.timeouts} timeouts`);
  }
  return {
    name,
    connections,
    seconds,
    reqPerSec: r.requests.average,
    p50: r.latency.p50,
    p99: r.latency.p99,
    max: r.latency.max,
    requests: r.requests.total,
  };
}

/**
 * `clients` users each print their own draft again and again for `seconds`, while one probe
 * asks /api/health every 50 ms. The cache must be off (PRINT_CACHE_MB=0) so every print renders.
 */
export async function printUnderLoad({ baseUrl, prints, seconds }) {
  const until = Date.now() + seconds * 1000;
  const printTimes = [];
  const healthTimes = [];
  let refused = 0;
  // A server that blocks for seconds can drop a kept-alive connection as it is reused
  // (ECONNRESET): counted, not fatal, and the health probe's time still counts.
  let resets = 0;
  const failed = [];
  const timed = async (url, headers) => {
    const t = performance.now();
    try {
      const res = await fetch(url, { headers });
      await res.arrayBuffer();
      return { status: res.status, ms: performance.now() - t };
    } catch {
      resets++;
      return { status: 0, ms: performance.now() - t };
    }
  };
  const printer = async ({ path, token }) => {
    while (Date.now() < until) {
      const r = await timed(baseUrl + path, { authorization: `Bearer ${token}` });
      if (r.status === 200) printTimes.push(r.ms);
      else if (r.status === 429) refused++;
      else if (r.status !== 0) failed.push(r.status);
    }
  };
  const probe = async () => {
    while (Date.now() < until) {
      healthTimes.push((await timed(`${baseUrl}/api/health`, {})).ms);
      await new Promise((r) => setTimeout(r, 50));
    }
  };
  const started = performance.now();
  await Promise.all([...prints.map(printer), probe()]);
  const elapsed = (performance.now() - started) / 1000;
  printTimes.sort((a, b) => a - b);
  healthTimes.sort((a, b) => a - b);
  return {
    prints: printTimes.length,
    printsPerSec: printTimes.length / elapsed,
    printP50: percentile(printTimes, 50),
    printP99: percentile(printTimes, 99),
    refused,
    resets,
    failed: failed.length,
    healthChecks: healthTimes.length,
    healthP50: percentile(healthTimes, 50),
    healthP99: percentile(healthTimes, 99),
    healthMax: healthTimes.at(-1),
  };
}
