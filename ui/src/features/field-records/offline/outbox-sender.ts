import { isApiRequestError } from '../../../lib/api-client';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import {
  getOutboxEntry,
  listOutbox,
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

let running: Promise<number> | null = null;

/**
 * Sends every record waiting on the device, oldest first, one at a time, and then its photos.
 * A record left 'sending' by a closed tab is sent again: the server keeps one record per id, so
 * a repeat is harmless. Concurrent calls share one run. Resolves to how many records were sent.
 */
export function flushOutbox(send: SendRecord, sendPhoto?: SendPhoto): Promise<number> {
  running ??= (async () => {
    let sent = 0;
    try {
      const waiting = (await listOutbox()).filter(
        (e) =>
          e.state === 'saved' ||
          e.state === 'sending' ||
          (e.state === 'sent' && waitingPhotos(e).length > 0),
      );
      for (const entry of waiting) {
        if (entry.state !== 'sent') {
          const outcome = await sendOne(entry, send);
          if (outcome === 'sent') sent++;
          // No connection: the rest would fail the same way; wait for the next 'online'.
          if (outcome === 'offline') break;
          if (outcome !== 'sent') continue;
        }
        if (sendPhoto && (await sendPhotos(entry.id, sendPhoto)) === 'offline') break;
      }
    } finally {
      running = null;
    }
    return sent;
  })();
  return running;
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
 * Sends the photos of a record the server has, one at a time. Unlike the record, a photo sent
 * twice is stored twice, so a photo is marked sent as soon as the server answers.
 */
async function sendPhotos(id: string, sendPhoto: SendPhoto): Promise<'done' | 'offline' | 'later'> {
  for (const photo of waitingPhotos(await getOutboxEntry(id))) {
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
