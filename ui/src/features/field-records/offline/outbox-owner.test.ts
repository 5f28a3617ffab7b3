import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { openDB } from 'idb';
import { beforeEach, describe, expect, it } from 'vitest';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import { flushOutbox } from './outbox-sender';
import {
  addOutboxPhotos,
  claimOutboxEntries,
  listOutbox,
  resetOutboxConnection,
  saveToOutbox,
  type OutboxPhoto,
} from './outbox-store';
import { summariseOutbox } from './outbox-summary';

const record = (id: string, findings = ''): CreateFieldRecordInput => ({
  id,
  positionId: '2b1c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
  revisionId: '3c2d4e5f-6071-4b8c-9d0e-1f2a3b4c5d6e',
  kind: 'periodic-inspection',
  performedAt: '2026-12-01T09:30:00Z',
  meterHours: null,
  measurements: [],
  checks: [],
  findings,
});
const R1 = '0f5e2a1c-7d3b-4c8e-9a6f-1b2c3d4e5f60';
const R2 = '1a6f3b2d-8e4c-4d9f-8b7a-2c3d4e5f6071';
const R3 = '2b7a4c3e-9f5d-4e0a-9c8b-3d4e5f607182';
const NOOR = {
  id: 'a1b2c3d4-0000-4000-8000-00000000000a',
  displayName: 'Noor Halden',
  initials: 'NH',
};
const TOMAS = {
  id: 'b2c3d4e5-0000-4000-8000-00000000000b',
  displayName: 'Tomas Reed',
  initials: 'TR',
};
const photo: OutboxPhoto = {
  id: 'p1',
  name: 'shoe-a.jpg',
  type: 'image/jpeg',
  size: 3,
  bytes: new ArrayBuffer(3),
  state: 'waiting',
};

/** A stand-in server that files each record under the session that sent it, as the real one. */
function server() {
  const stored = new Map<string, { by: string; findings: string }>();
  let calls = 0;
  const sendAs = (userId: string) => async (p: CreateFieldRecordInput) => {
    calls++;
    if (!stored.has(p.id)) stored.set(p.id, { by: userId, findings: p.findings });
    return p;
  };
  const flushAs = (userId: string, stillSignedIn = () => true) =>
    flushOutbox(userId, sendAs(userId), undefined, stillSignedIn);
  return { stored, calls: () => calls, flushAs };
}

/** Writes an entry as the version before owners did: no owner field at all. */
async function keepAsBeforeOwners(payload: CreateFieldRecordInput, photos: OutboxPhoto[] = []) {
  const database = await openDB('holdfast-field-records', 1, {
    upgrade(d) {
      d.createObjectStore('outbox', { keyPath: 'id' }).createIndex('state', 'state');
    },
  });
  const entry = { id: payload.id, payload, state: 'saved', savedAt: '2026-11-30T08:00:00Z' };
  await database.put('outbox', { ...entry, attempts: 0, photos });
  database.close();
}

beforeEach(() => {
  globalThis.indexedDB = new IDBFactory();
  resetOutboxConnection();
});

describe('outbox entries belong to the person who saved them', () => {
  it("another person's session sends nothing of theirs; their own sends it exactly once", async () => {
    const s = server();
    await saveToOutbox(record(R1, 'Noor, offline'), NOOR);
    await saveToOutbox(record(R2, 'Tomas'), TOMAS);

    expect(await s.flushAs(TOMAS.id)).toBe(1);
    expect([...s.stored.entries()]).toEqual([[R2, { by: TOMAS.id, findings: 'Tomas' }]]);
    const noors = (await listOutbox()).find((e) => e.id === R1)!;
    expect(noors.state).toBe('saved');
    expect(noors.owner).toEqual(NOOR);

    expect(await s.flushAs(NOOR.id)).toBe(1);
    expect(await s.flushAs(NOOR.id)).toBe(0);
    expect(s.stored.get(R1)).toEqual({ by: NOOR.id, findings: 'Noor, offline' });
    expect(s.calls()).toBe(2);
  });

  it("refuses to save over another person's entry and keeps theirs as it was", async () => {
    await saveToOutbox(record(R1, 'Noor'), NOOR);
    await expect(saveToOutbox(record(R1, 'Tomas'), TOMAS)).rejects.toThrow(/another person/);
    await expect(addOutboxPhotos(R1, [photo], TOMAS.id)).rejects.toThrow(/another person/);
    const [kept] = await listOutbox();
    expect(kept!.payload.findings).toBe('Noor');
    expect(kept!.owner?.id).toBe(NOOR.id);
    expect(kept!.photos).toEqual([]);
  });

  it('stops sending as soon as the session is no longer the owner (signed out mid-run)', async () => {
    const s = server();
    await saveToOutbox(record(R1), NOOR, new Date('2026-12-01T10:00:00Z'));
    await saveToOutbox(record(R2), NOOR, new Date('2026-12-01T10:05:00Z'));
    let checks = 0;
    // Signed in for the first record only.
    expect(await s.flushAs(NOOR.id, () => ++checks <= 1)).toBe(1);
    expect([...s.stored.keys()]).toEqual([R1]);
    expect((await listOutbox()).map((e) => e.state)).toEqual(['sent', 'saved']);
  });

  it('entries from before owners were stored are sent by nobody until someone claims them', async () => {
    const s = server();
    await keepAsBeforeOwners(record(R1, 'old'), [photo]);
    await saveToOutbox(record(R2, 'Noor'), NOOR);
    expect(await s.flushAs(TOMAS.id)).toBe(0);
    expect(await s.flushAs(NOOR.id)).toBe(1);
    expect(s.stored.has(R1)).toBe(false);

    const seen = summariseOutbox(await listOutbox(), TOMAS.id);
    expect(seen.unassigned.map((e) => e.id)).toEqual([R1]);
    expect(seen.unassignedWaiting).toEqual({ records: 1, photos: 1 });

    // Claiming takes only unassigned entries: Noor's stays Noor's.
    expect(await claimOutboxEntries([R1, R2], TOMAS)).toBe(1);
    const owners = Object.fromEntries((await listOutbox()).map((e) => [e.id, e.owner?.id]));
    expect(owners).toEqual({ [R1]: TOMAS.id, [R2]: NOOR.id });
    expect(await s.flushAs(TOMAS.id)).toBe(1);
    expect(s.stored.get(R1)).toEqual({ by: TOMAS.id, findings: 'old' });
  });
});

describe('what the device holds, by whose it is', () => {
  it('counts per person, leaves out what was sent, and names them as stored', async () => {
    const s = server();
    await saveToOutbox(record(R1), NOOR, new Date('2026-12-01T10:00:00Z'), [photo]);
    await saveToOutbox(record(R2), NOOR, new Date('2026-12-01T10:05:00Z'));
    await saveToOutbox(record(R3), TOMAS, new Date('2026-12-01T10:10:00Z'));
    await s.flushAs(TOMAS.id);

    const asTomas = summariseOutbox(await listOutbox(), TOMAS.id);
    expect(asTomas.mine).toEqual({ records: 0, photos: 0 });
    expect(asTomas.others).toEqual([{ owner: NOOR, records: 2, photos: 1 }]);
    expect(asTomas.unassigned).toEqual([]);

    const onSignIn = summariseOutbox(await listOutbox(), null);
    expect(onSignIn.others.map((o) => o.owner.initials)).toEqual(['NH']);
    expect(summariseOutbox(await listOutbox(), NOOR.id).mine).toEqual({ records: 2, photos: 1 });
  });
});
