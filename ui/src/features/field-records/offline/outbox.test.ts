import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { beforeEach, describe, expect, it } from 'vitest';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import { ApiRequestError } from '../../../lib/api-error';
import { flushOutbox, type SendPhoto, type SendRecord } from './outbox-sender';
import {
  addOutboxPhotos,
  listOutbox,
  resetOutboxConnection,
  saveToOutbox,
  type OutboxPhoto,
} from './outbox-store';

const record = (id: string): CreateFieldRecordInput => ({
  id,
  positionId: '2b1c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
  revisionId: '3c2d4e5f-6071-4b8c-9d0e-1f2a3b4c5d6e',
  kind: 'periodic-inspection',
  performedAt: '2026-12-01T09:30:00Z',
  meterHours: null,
  measurements: [{ settingKey: 'reserveStroke', asFound: 0.009, asLeft: 0.012, reason: '' }],
  checks: [],
  findings: '',
});
const A = '0f5e2a1c-7d3b-4c8e-9a6f-1b2c3d4e5f60';
const B = '1a6f3b2d-8e4c-4d9f-8b7a-2c3d4e5f6071';
const NOOR = {
  id: 'a1b2c3d4-0000-4000-8000-00000000000a',
  displayName: 'Noor Halden',
  initials: 'NH',
};

/** Sends as Noor, who stays signed in throughout unless a test says otherwise. */
const flush = (send: SendRecord, sendPhoto?: SendPhoto) =>
  flushOutbox(NOOR.id, send, sendPhoto, () => true);

/** A stand-in server that keeps records by id, as the real create does. */
function fakeServer() {
  const stored = new Map<string, CreateFieldRecordInput>();
  let calls = 0;
  let mode: 'offline' | 'up' | 'refuse' | 'error' = 'up';
  return {
    stored,
    calls: () => calls,
    set: (m: typeof mode) => (mode = m),
    send: async (p: CreateFieldRecordInput) => {
      calls++;
      if (mode === 'offline') throw ApiRequestError.network();
      if (mode === 'error') throw new ApiRequestError(503, 'service_unavailable', 'not ready');
      if (mode === 'refuse') {
        throw new ApiRequestError(400, 'validation_failed', 'Invalid record', [
          { path: 'measurements.0.asLeft', message: 'must be a number' },
        ]);
      }
      stored.set(p.id, p);
      return p;
    },
  };
}

beforeEach(() => {
  globalThis.indexedDB = new IDBFactory();
  resetOutboxConnection();
});

describe('field record outbox', () => {
  it('keeps records while offline and sends each exactly once when back', async () => {
    const server = fakeServer();
    server.set('offline');
    await saveToOutbox(record(A), NOOR, new Date('2026-12-01T10:00:00Z'));
    await saveToOutbox(record(B), NOOR, new Date('2026-12-01T10:05:00Z'));
    expect(await flush(server.send)).toBe(0);
    // Offline stops the run at the first failure: the second is not tried in vain.
    expect(server.calls()).toBe(1);
    expect((await listOutbox()).map((e) => e.state)).toEqual(['saved', 'saved']);

    server.set('up');
    expect(await flush(server.send)).toBe(2);
    expect(await flush(server.send)).toBe(0);
    expect([...server.stored.keys()].sort()).toEqual([A, B].sort());
    const entries = await listOutbox();
    expect(entries.map((e) => e.state)).toEqual(['sent', 'sent']);
    expect(entries[0]!.attempts).toBe(2);
  });

  it('saving the same record again replaces it instead of adding a second', async () => {
    await saveToOutbox(record(A), NOOR);
    await saveToOutbox({ ...record(A), findings: 'Lining A worn at the heel' }, NOOR);
    const entries = await listOutbox();
    expect(entries).toHaveLength(1);
    expect(entries[0]!.payload.findings).toBe('Lining A worn at the heel');
  });

  it('a record left "sending" (tab closed mid-send) is sent again, and the server keeps one', async () => {
    const server = fakeServer();
    await saveToOutbox(record(A), NOOR);
    await server.send(record(A)); // the first send reached the server, its answer was lost
    const { updateOutboxEntry } = await import('./outbox-store');
    await updateOutboxEntry(A, { state: 'sending' });
    expect(await flush(server.send)).toBe(1);
    expect(server.stored.size).toBe(1);
  });

  it('a refusal keeps the record with the field errors for the fitter', async () => {
    const server = fakeServer();
    server.set('refuse');
    await saveToOutbox(record(A), NOOR);
    await flush(server.send);
    const [entry] = await listOutbox();
    expect(entry!.state).toBe('refused');
    expect(entry!.fields).toEqual([{ path: 'measurements.0.asLeft', message: 'must be a number' }]);
    // Refused records are not sent again on their own.
    server.set('up');
    expect(await flush(server.send)).toBe(0);
  });

  it('a server error leaves the record waiting for the next try', async () => {
    const server = fakeServer();
    server.set('error');
    await saveToOutbox(record(A), NOOR);
    await flush(server.send);
    const [entry] = await listOutbox();
    expect(entry!.state).toBe('saved');
    expect(entry!.message).toBe('not ready');
  });

  it('refuses to overwrite a record that was already sent', async () => {
    const server = fakeServer();
    await saveToOutbox(record(A), NOOR);
    await flush(server.send);
    await expect(saveToOutbox(record(A), NOOR)).rejects.toThrow(/already been sent/);
  });
});

const photo = (name: string, bytes = [0xff, 0xd8, 0xff]): OutboxPhoto => ({
  id: `photo-${name}`,
  name,
  type: 'image/jpeg',
  size: bytes.length,
  bytes: new Uint8Array(bytes).buffer,
  state: 'waiting',
});

/** A stand-in photo upload: keeps what it was sent per record, or fails as told. */
function fakePhotos() {
  const stored: { recordId: string; name: string; bytes: number[] }[] = [];
  let mode: 'offline' | 'up' = 'up';
  return {
    stored,
    set: (m: typeof mode) => (mode = m),
    send: async (recordId: string, p: OutboxPhoto) => {
      if (mode === 'offline') throw ApiRequestError.network();
      if (p.name.endsWith('.gif')) {
        throw new ApiRequestError(415, 'unsupported_media_type', 'Photos are PNG or JPEG.', [
          { path: 'file', message: 'content is not a PNG or JPEG image' },
        ]);
      }
      stored.push({ recordId, name: p.name, bytes: [...new Uint8Array(p.bytes)] });
      return p;
    },
  };
}

describe('photos kept with a record in the outbox', () => {
  it('keeps photos offline and sends each once, after its record, when back', async () => {
    const server = fakeServer();
    const photos = fakePhotos();
    server.set('offline');
    photos.set('offline');
    await saveToOutbox(record(A), NOOR, new Date(), [photo('shoe-a.jpg'), photo('shoe-b.jpg')]);
    await flush(server.send, photos.send);
    expect(photos.stored).toEqual([]);
    const [kept] = await listOutbox();
    expect(kept!.photos!.map((p) => [p.name, p.state])).toEqual([
      ['shoe-a.jpg', 'waiting'],
      ['shoe-b.jpg', 'waiting'],
    ]);
    expect([...new Uint8Array(kept!.photos![0]!.bytes)]).toEqual([0xff, 0xd8, 0xff]);

    server.set('up');
    photos.set('up');
    expect(await flush(server.send, photos.send)).toBe(1);
    await flush(server.send, photos.send);
    expect(server.stored.has(A)).toBe(true);
    expect(photos.stored.map((p) => [p.recordId, p.name])).toEqual([
      [A, 'shoe-a.jpg'],
      [A, 'shoe-b.jpg'],
    ]);
    const [sent] = await listOutbox();
    expect(sent!.photos!.every((p) => p.state === 'sent')).toBe(true);
  });

  it('a photo the server refuses is marked with its reason; the others still go', async () => {
    const server = fakeServer();
    const photos = fakePhotos();
    await saveToOutbox(record(A), NOOR, new Date(), [photo('sketch.gif'), photo('lining.jpg')]);
    await flush(server.send, photos.send);
    const [entry] = await listOutbox();
    expect(entry!.state).toBe('sent');
    expect(entry!.photos!.map((p) => [p.name, p.state, p.message])).toEqual([
      ['sketch.gif', 'refused', 'Photos are PNG or JPEG.'],
      ['lining.jpg', 'sent', undefined],
    ]);
    expect(photos.stored.map((p) => p.name)).toEqual(['lining.jpg']);
  });

  it('photos added after the record was sent go on the next run; saving again keeps them', async () => {
    const server = fakeServer();
    const photos = fakePhotos();
    server.set('offline');
    await saveToOutbox(record(A), NOOR, new Date(), [photo('before.jpg')]);
    // Re-saving the unsent record (an edit) keeps the photo already kept with it.
    await saveToOutbox({ ...record(A), findings: 'Drag on shoe B' }, NOOR, new Date());
    expect((await listOutbox())[0]!.photos!.map((p) => p.name)).toEqual(['before.jpg']);
    server.set('up');
    await flush(server.send, photos.send);
    await addOutboxPhotos(A, [photo('after.jpg')], NOOR.id);
    expect(await flush(server.send, photos.send)).toBe(0);
    expect(photos.stored.map((p) => p.name)).toEqual(['before.jpg', 'after.jpg']);
    // The record itself is not sent again for the later photo.
    expect(server.calls()).toBe(1);
  });
});
