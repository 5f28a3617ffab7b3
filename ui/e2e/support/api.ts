import { demoPassword, demoUsers, type DemoUserKey } from './demo-users';

/** Calls the API of the app under test as a demo user (set-up steps that are not under test). */
export async function apiClientAs(baseUrl: string, who: DemoUserKey) {
  const res = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: demoUsers[who].email, password: demoPassword }),
  });
  if (!res.ok) throw new Error(`sign-in as ${who} failed: ${res.status}`);
  const { accessToken } = (await res.json()) as { accessToken: string };
  return async <T = unknown>(method: string, path: string, body?: unknown): Promise<T> => {
    const r = await fetch(`${baseUrl}/api${path}`, {
      method,
      headers: {
        Authorization: `Bearer ${accessToken}`,
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await r.text();
    if (!r.ok) throw new Error(`${method} ${path}: ${r.status} ${text}`);
    return (text ? JSON.parse(text) : undefined) as T;
  };
}

interface RegisterAnswer {
  sites: { machines: { positions: { id: string; tag: string }[] }[] }[];
}

/** A new hoist sheet (its first revision a draft) on a seeded position; returns its page path. */
export async function createHoistSheet(
  baseUrl: string,
  who: DemoUserKey,
  title: string,
  extra: Record<string, unknown> = {},
): Promise<{ path: string; sheetId: string; revisionId: string }> {
  const call = await apiClientAs(baseUrl, who);
  const register = await call<RegisterAnswer>('GET', '/register');
  const positions = register.sites.flatMap((s) => s.machines.flatMap((m) => m.positions));
  const position = positions.find((p) => p.tag === 'B2') ?? positions[0]!;
  const sheet = await call<{ id: string; latest: { id: string } }>('POST', '/sheets', {
    title,
    positionId: position.id,
    sheetType: 'hoist-shoe-brake',
    start: { kind: 'example' },
    ...extra,
  });
  return {
    path: `/sheets/${sheet.id}/revisions/${sheet.latest.id}`,
    sheetId: sheet.id,
    revisionId: sheet.latest.id,
  };
}

const tokens = new Map<string, string>();

/**
 * Calls the API as a demo user, for setting up a scene faster than clicking through it. Tokens are
 * cached per user so the sign-in throttle is never reached.
 */
export async function apiAs<T = any>(
  baseUrl: string,
  who: DemoUserKey,
  method: string,
  path: string,
  body?: unknown,
): Promise<T> {
  let token = tokens.get(who);
  if (!token) {
    const res = await fetch(`${baseUrl}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: demoUsers[who].email, password: demoPassword }),
    });
    if (!res.ok) throw new Error(`sign-in as ${who}: ${res.status} ${await res.text()}`);
    token = ((await res.json()) as { accessToken: string }).accessToken;
    tokens.set(who, token);
  }
  const res = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: {
      Authorization: `Bearer ${token}`,
      ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  if (!res.ok) throw new Error(`${method} ${path} as ${who}: ${res.status} ${text}`);
  return (text ? JSON.parse(text) : undefined) as T;
}

/** Creates a sheet on the first register position through the API; returns its ids. */
export async function createSheetViaApi(baseUrl: string, title: string, positionTag?: string) {
  const reg = await apiAs(baseUrl, 'engineer', 'GET', '/register');
  const positions = reg.sites.flatMap((s: any) => s.machines.flatMap((m: any) => m.positions)) as {
    id: string;
    tag: string;
  }[];
  const position = positionTag ? positions.find((p) => p.tag === positionTag) : positions[0];
  if (!position) throw new Error(`no position ${positionTag ?? ''} in the register`);
  const sheet = await apiAs(baseUrl, 'engineer', 'POST', '/sheets', {
    title,
    positionId: position.id,
    sheetType: 'hoist-shoe-brake',
    start: { kind: 'example' },
  });
  // The example's values come marked; the author confirms them all, as "I have checked all" does.
  const revisionId = sheet.revisions[0].id as string;
  const rev = await apiAs(baseUrl, 'engineer', 'GET', `/revisions/${revisionId}`);
  await apiAs(baseUrl, 'engineer', 'PUT', `/revisions/${revisionId}`, {
    inputs: rev.inputs,
    unitSystem: rev.unitSystem,
    changeNote: 'Example duty confirmed for the test.',
    unconfirmed: [],
    rowVersion: rev.rowVersion,
  });
  return { sheetId: sheet.id as string, revisionId, sheet };
}

/** Sends a revision for check as the engineer, with a note to the checker. */
export async function submitViaApi(baseUrl: string, revisionId: string, justification: string) {
  const rev = await apiAs(baseUrl, 'engineer', 'GET', `/revisions/${revisionId}`);
  return apiAs(baseUrl, 'engineer', 'POST', `/revisions/${revisionId}/submit`, {
    rowVersion: rev.rowVersion,
    justification,
  });
}
