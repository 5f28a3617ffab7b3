import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { CreateFieldRecordInput } from '@holdfast/shared';

/**
 * Field records kept on the device until the server has them. Keyed by the record's own id,
 * generated on the device, so saving the same record twice overwrites rather than duplicates,
 * and sending it again is safe (the server's create is idempotent by that id).
 */
export type OutboxState = 'saved' | 'sending' | 'sent' | 'refused';

/** Where a photo kept with a record stands: waiting to be sent, on the server, or refused. */
export type OutboxPhotoState = 'waiting' | 'sent' | 'refused';

/**
 * A photo kept on the device with its record, sent after the record (the server takes photos
 * only for a record it has, while it is a draft).
 */
export interface OutboxPhoto {
  /** Made on the device, to tell two photos of the same name apart. */
  id: string;
  name: string;
  /** The content type the browser gave; the server decides by the bytes. */
  type: string;
  size: number;
  /** The bytes: an ArrayBuffer is stored by every IndexedDB, a File not by all. */
  bytes: ArrayBuffer;
  state: OutboxPhotoState;
  /** The server's reason for refusing it. */
  message?: string;
}

/**
 * Who made an entry on this device, as they were signed in when they saved it. Only their own
 * session sends it: the server files a record under whoever's token carries it, so sending
 * another person's entry would sign their work with the wrong name.
 */
export interface OutboxOwner {
  id: string;
  displayName: string;
  initials: string;
}

export interface OutboxEntry {
  id: string;
  /**
   * Absent in entries kept by the version before owners were stored: those are "unassigned"
   * and sent only after the signed-in user confirms they made them (`claimOutboxEntries`).
   */
  owner?: OutboxOwner;
  payload: CreateFieldRecordInput;
  state: OutboxState;
  /** ISO time the fitter saved it on the device. */
  savedAt: string;
  /** How many times sending was tried. */
  attempts: number;
  /** Why the server refused it, with the field errors, or the last connection failure. */
  message?: string;
  fields?: { path: string; message: string }[];
  /** Photos to send once the record is on the server (absent in entries saved before photos). */
  photos?: OutboxPhoto[];
}

interface OutboxDb extends DBSchema {
  outbox: { key: string; value: OutboxEntry; indexes: { state: OutboxState } };
}

const DB_NAME = 'holdfast-field-records';
let dbPromise: Promise<IDBPDatabase<OutboxDb>> | null = null;

function db(): Promise<IDBPDatabase<OutboxDb>> {
  dbPromise ??= openDB<OutboxDb>(DB_NAME, 1, {
    upgrade(database) {
      const store = database.createObjectStore('outbox', { keyPath: 'id' });
      store.createIndex('state', 'state');
    },
  });
  return dbPromise;
}

type Listener = () => void;
const listeners = new Set<Listener>();

/** Calls `fn` after every change to the outbox (for the state shown to the fitter). */
export function subscribeOutbox(fn: Listener): () => void {
  listeners.add(fn);
  return () => listeners.delete(fn);
}

function changed(): void {
  for (const fn of listeners) fn();
}

/**
 * Keeps a record on the device for `owner`, ready to send; replaces an unsent entry with the
 * same id and keeps the photos it already held, adding `photos`. Another person's entry is never
 * replaced.
 */
export async function saveToOutbox(
  payload: CreateFieldRecordInput,
  owner: OutboxOwner,
  now = new Date(),
  photos: readonly OutboxPhoto[] = [],
) {
  const database = await db();
  const existing = await database.get('outbox', payload.id);
  if (existing?.state === 'sent') throw new Error('this record has already been sent');
  if (existing?.owner && existing.owner.id !== owner.id) {
    throw new Error('this record was saved on this device by another person');
  }
  const entry: OutboxEntry = {
    id: payload.id,
    owner: { id: owner.id, displayName: owner.displayName, initials: owner.initials },
    payload,
    state: 'saved',
    savedAt: now.toISOString(),
    attempts: existing?.attempts ?? 0,
    photos: [...(existing?.photos ?? []), ...photos],
  };
  await database.put('outbox', entry);
  changed();
  return entry;
}

export async function listOutbox(): Promise<OutboxEntry[]> {
  const all = await (await db()).getAll('outbox');
  return all.sort((a, b) => a.savedAt.localeCompare(b.savedAt));
}

export async function getOutboxEntry(id: string): Promise<OutboxEntry | undefined> {
  return (await db()).get('outbox', id);
}

/** Whether `userId` may send this entry: it is theirs (unassigned ones wait to be claimed). */
export function ownedBy(entry: OutboxEntry, userId: string): boolean {
  return entry.owner?.id === userId;
}

/**
 * Whether an entry has something to send: its record, or photos of a record the server has (a
 * refused record waits for the fitter, photos and all).
 */
export function hasWork(entry: OutboxEntry): boolean {
  return (
    entry.state === 'saved' ||
    entry.state === 'sending' ||
    (entry.state === 'sent' && waitingPhotos(entry).length > 0)
  );
}

/**
 * The signed-in user takes unassigned entries (kept before owners were stored) as theirs, after
 * they confirmed they made them; entries of a known person are left alone.
 */
export async function claimOutboxEntries(
  ids: readonly string[],
  owner: OutboxOwner,
): Promise<number> {
  const tx = (await db()).transaction('outbox', 'readwrite');
  let claimed = 0;
  for (const id of ids) {
    const entry = await tx.store.get(id);
    if (!entry || entry.owner) continue;
    const { id: ownerId, displayName, initials } = owner;
    await tx.store.put({ ...entry, owner: { id: ownerId, displayName, initials } });
    claimed++;
  }
  await tx.done;
  changed();
  return claimed;
}

/** Writes an entry's new state in one transaction. */
export async function updateOutboxEntry(
  id: string,
  patch: Partial<Omit<OutboxEntry, 'id' | 'payload' | 'owner'>>,
): Promise<OutboxEntry | undefined> {
  const tx = (await db()).transaction('outbox', 'readwrite');
  const entry = await tx.store.get(id);
  if (!entry) {
    await tx.done;
    return undefined;
  }
  const next = { ...entry, ...patch };
  await tx.store.put(next);
  await tx.done;
  changed();
  return next;
}

/** The device's copy of a record takes the changes the server accepted after it was sent. */
export async function replaceOutboxPayload(
  id: string,
  changes: Partial<Omit<CreateFieldRecordInput, 'id' | 'positionId' | 'revisionId'>>,
): Promise<void> {
  const tx = (await db()).transaction('outbox', 'readwrite');
  const entry = await tx.store.get(id);
  if (entry) await tx.store.put({ ...entry, payload: { ...entry.payload, ...changes } });
  await tx.done;
  changed();
}

/**
 * Adds photos to a record `userId` kept on the device (also after it was sent); never to another
 * person's record, whose photos would then go under their name.
 */
export async function addOutboxPhotos(id: string, photos: readonly OutboxPhoto[], userId: string) {
  const tx = (await db()).transaction('outbox', 'readwrite');
  const entry = await tx.store.get(id);
  if (!entry || !ownedBy(entry, userId)) {
    await tx.done;
    throw new Error(
      entry ? 'this record was saved by another person' : 'this record is not kept on this device',
    );
  }
  await tx.store.put({ ...entry, photos: [...(entry.photos ?? []), ...photos] });
  await tx.done;
  changed();
}

/** Writes one photo's new state. */
export async function updateOutboxPhoto(
  id: string,
  photoId: string,
  patch: Pick<OutboxPhoto, 'state' | 'message'>,
): Promise<void> {
  const tx = (await db()).transaction('outbox', 'readwrite');
  const entry = await tx.store.get(id);
  if (entry) {
    const photos = (entry.photos ?? []).map((p) => (p.id === photoId ? { ...p, ...patch } : p));
    await tx.store.put({ ...entry, photos });
  }
  await tx.done;
  changed();
}

/** Photos of an entry still to be sent. */
export function waitingPhotos(entry: OutboxEntry | undefined): OutboxPhoto[] {
  return (entry?.photos ?? []).filter((p) => p.state === 'waiting');
}

/** Drops an entry the fitter no longer wants (a refused one after re-entering it, or a sent one). */
export async function removeFromOutbox(id: string): Promise<void> {
  await (await db()).delete('outbox', id);
  changed();
}

/** For tests: forget the open connection so a fresh IndexedDB can be used. */
export function resetOutboxConnection(): void {
  dbPromise = null;
}
