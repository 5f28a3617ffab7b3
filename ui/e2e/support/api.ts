import { demoPassword, demoUsers, type DemoUserKey } from './demo-users';

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

/** A demo user's access token, signed in once per app and user (the sign-in throttle is never reached). */
async function tokenFor(baseUrl: string, who: DemoUserKey, fresh = false): Promise<string> {
  const key = `${baseUrl} ${who}`;
  const cached = tokens.get(key);
  if (cached && !fresh) return cached;
  const res = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: demoUsers[who].email, password: demoPassword }),
  });
  if (!res.ok) throw new Error(`sign-in as ${who}: ${res.status} ${await res.text()}`);
  const token = ((await res.json()) as { accessToken: string }).accessToken;
  tokens.set(key, token);
  return token;
}

/**
 * Calls the API as a demo user, for setting up a scene faster than clicking through it (set-up
 * steps that are not under test). A token a test has signed out is replaced once.
 */
export async function apiAs<T = any>(
  baseUrl: string,
  who: DemoUserKey,
  method: string,
  path: string,
  body?: unknown,
): Promise<T> {
  const send = async (token: string) =>
    fetch(`${baseUrl}/api${path}`, {
      method,
      headers: {
        Authorization: `Bearer ${token}`,
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  let res = await send(await tokenFor(baseUrl, who));
  if (res.status === 401) res = await send(await tokenFor(baseUrl, who, true));
  const text = await res.text();
  if (!res.ok) throw new Error(`${method} ${path} as ${who}: ${res.status} ${text}`);
  return (text ? JSON.parse(text) : undefined) as T;
}

/** `apiAs` bound to one user (signed in now, so a refused sign-in shows here). */
export async function apiClientAs(baseUrl: string, who: DemoUserKey) {
  await tokenFor(baseUrl, who);
  return <T = unknown>(method: string, path: string, body?: unknown): Promise<T> =>
    apiAs<T>(baseUrl, who, method, path, body);
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
