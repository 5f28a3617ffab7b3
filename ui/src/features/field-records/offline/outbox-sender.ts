import { isApiRequestError } from '../../../lib/api-client';
import { sessionStore } from '../../../lib/session';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import {
  getOutboxEntry,
  hasWork,
  listOutbox,
  ownedBy,
  updateOutboxEntry,
  updateOutboxPhoto,
  waitingPhotos,
  type OutboxEntry,
  type OutboxPhoto,
} from './outbox-store';

/** Sends one record to the server; resolves when stored there (created now or before). */
export type SendRecord = (payload: CreateFieldRecordInput) => Promise<unknown>;

/** Sends one photo of a record the server already has. */
export type SendPhoto = (recordId: string, photo: OutboxPhoto) => Promise<unknown>;

/**
 * Answers that mean "this record will never be accepted as it is": the fitter must look at it.
 * Everything else (no connection, 5xx, 401 before the session is back, 429) is tried again later.
 */
const REFUSED = new Set([400, 403, 404, 409, 413, 422]);
/** A photo is also refused for its content type (not a PNG or JPEG). */
const PHOTO_REFUSED = new Set([...REFUSED, 415]);

const running = new Map<string, Promise<number>>();

/** Whether `userId` is still the one signed in on this page (checked before every request). */
export function signedInAs(userId: string): () => boolean {
  return () => sessionStore.getState().user?.id === userId;
}

/**
 * Sends every record `userId` saved on the device, oldest first, one at a time, and then its
 * photos; other people's entries and unassigned ones stay where they are. The server files a
 * record under the session that sends it, so the run stops as soon as `stillSignedIn` says the
 * session changed (a sign-out mid-run). A record left 'sending' by a closed tab is sent again:
 * the server keeps one record per id, so a repeat is harmless. Concurrent calls for one user
 * share one run. Resolves to how many records were sent.
 */
export function flushOutbox(
  userId: string,
  send: SendRecord,
  sendPhoto?: SendPhoto,
  stillSignedIn: () => boolean = signedInAs(userId),
): Promise<number> {
  const current = running.get(userId);
  if (current) return current;
  const run = (async () => {
    let sent = 0;
    try {
      const waiting = (await listOutbox()).filter((e) => ownedBy(e, userId) && hasWork(e));
      for (const entry of waiting) {
        if (!stillSignedIn()) break;
        if (entry.state !== 'sent') {
          const outcome = await sendOne(entry, send);
          if (outcome === 'sent') sent++;
          // No connection: the rest would fail the same way; wait for the next 'online'.
          if (outcome === 'offline') break;
          if (outcome !== 'sent') continue;
        }
        if (!sendPhoto) continue;
        const photos = await sendPhotos(entry.id, sendPhoto, stillSignedIn);
        if (photos === 'offline' || photos === 'signed-out') break;
      }
    } finally {
      running.delete(userId);
    }
    return sent;
  })();
  running.set(userId, run);
  return run;
}

async function sendOne(
  entry: OutboxEntry,
  send: SendRecord,
): Promise<'sent' | 'refused' | 'offline' | 'later'> {
  await updateOutboxEntry(entry.id, { state: 'sending', attempts: entry.attempts + 1 });
  try {
    await send(entry.payload);
    await updateOutboxEntry(entry.id, { state: 'sent', message: undefined, fields: undefined });
    return 'sent';
  } catch (error) {
    if (isApiRequestError(error) && REFUSED.has(error.status)) {
      await updateOutboxEntry(entry.id, {
        state: 'refused',
        message: error.message,
        fields: error.fields.map((f) => ({ path: f.path, message: f.message })),
      });
      return 'refused';
    }
    const message = error instanceof Error ? error.message : String(error);
    await updateOutboxEntry(entry.id, { state: 'saved', message });
    return isApiRequestError(error) && error.status === 0 ? 'offline' : 'later';
  }
}

/**
 * Sends the photos of a record the server has, one at a time, each marked sent as soon as the
 * server answers. A photo whose answer was lost is sent again on the next round: the server knows
 * it by its content and answers with the photo it already filed.
 */
async function sendPhotos(
  id: string,
  sendPhoto: SendPhoto,
  stillSignedIn: () => boolean,
): Promise<'done' | 'offline' | 'later' | 'signed-out'> {
  for (const photo of waitingPhotos(await getOutboxEntry(id))) {
    if (!stillSignedIn()) return 'signed-out';
    try {
      await sendPhoto(id, photo);
      await updateOutboxPhoto(id, photo.id, { state: 'sent', message: undefined });
    } catch (error) {
      if (isApiRequestError(error) && PHOTO_REFUSED.has(error.status)) {
        await updateOutboxPhoto(id, photo.id, { state: 'refused', message: error.message });
        continue;
      }
      const message = error instanceof Error ? error.message : String(error);
      await updateOutboxPhoto(id, photo.id, { state: 'waiting', message });
      return isApiRequestError(error) && error.status === 0 ? 'offline' : 'later';
    }
  }
  return 'done';
}
