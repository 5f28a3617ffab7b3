import { isApiRequestError } from '../../../lib/api-client';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import { listOutbox, updateOutboxEntry, type OutboxEntry } from './outbox-store';

/** Sends one record to the server; resolves when stored there (created now or before). */
export type SendRecord = (payload: CreateFieldRecordInput) => Promise<unknown>;

/**
 * Answers that mean "this record will never be accepted as it is": the fitter must look at it.
 * Everything else (no connection, 5xx, 401 before the session is back, 429) is tried again later.
 */
const REFUSED = new Set([400, 403, 404, 409, 413, 422]);

let running: Promise<number> | null = null;

/**
 * Sends every record waiting on the device, oldest first, one at a time. A record left
 * 'sending' by a closed tab is sent again: the server keeps one record per id, so a repeat
 * is harmless. Concurrent calls share one run. Resolves to how many were sent.
 */
export function flushOutbox(send: SendRecord): Promise<number> {
  running ??= (async () => {
    let sent = 0;
    try {
      const waiting = (await listOutbox()).filter(
        (e) => e.state === 'saved' || e.state === 'sending',
      );
      for (const entry of waiting) {
        const outcome = await sendOne(entry, send);
        if (outcome === 'sent') sent++;
        // No connection: the rest would fail the same way; wait for the next 'online'.
        if (outcome === 'offline') break;
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
