import { demoPassword, demoUsers, type DemoUserKey } from './demo-users';

/** Calls the API of the app under test as a demo user (set-up steps that are not under test). */
export async function apiAs(baseUrl: string, who: DemoUserKey) {
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
  const call = await apiAs(baseUrl, who);
  const register = await call<RegisterAnswer>('GET', '/register');
  const positions = register.sites.flatMap((s) => s.machines.flatMap((m) => m.positions));
  const position = positions.find((p) => p.tag === 'B2') ?? positions[0]!;
  const sheet = await call<{ id: string; latest: { id: string } }>('POST', '/sheets', {
    title,
    positionId: position.id,
    sheetType: 'hoist-shoe-brake',
    ...extra,
  });
  return {
    path: `/sheets/${sheet.id}/revisions/${sheet.latest.id}`,
    sheetId: sheet.id,
    revisionId: sheet.latest.id,
  };
}
