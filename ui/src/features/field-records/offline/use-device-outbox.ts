import { useCallback, useEffect, useState } from 'react';
import { createFieldRecord } from '../api/create-field-record';
import { uploadFieldPhoto } from '../api/upload-field-photo';
import { SERVER_RETRY_MS, subscribeServerBack } from '../../../lib/server-reach';
import { flushOutbox, type SendPhoto, type SendRecord } from './outbox-sender';
import {
  claimOutboxEntries,
  listOutbox,
  subscribeOutbox,
  type OutboxEntry,
  type OutboxOwner,
} from './outbox-store';
import { summariseOutbox, type OutboxSummary } from './outbox-summary';

/** Retries of waiting work: a few times a minute, not a load on the server. */
const RETRY_EVERY_MS = 6 * SERVER_RETRY_MS;

/** Everything the device holds; nothing when it has no IndexedDB (a private window, a test). */
async function listAll(): Promise<OutboxEntry[]> {
  try {
    return await listOutbox();
  } catch {
    return [];
  }
}

/**
 * The whole device outbox as the signed-in user sees it, wherever they are in the app: sends
 * their own entries when they sign in and when the connection returns (not only when the record
 * form is open), and tells them what other people left here. Other people's entries are never
 * sent under this session; unassigned ones only after `claimUnassigned`.
 */
export function useDeviceOutbox(
  user: OutboxOwner,
  send: SendRecord = createFieldRecord,
  sendPhoto: SendPhoto = uploadFieldPhoto,
) {
  const { id: userId, displayName, initials } = user;
  const [summary, setSummary] = useState<OutboxSummary>(() => summariseOutbox([], userId));

  useEffect(() => {
    let live = true;
    const reload = () =>
      void listAll().then((entries) => {
        if (live) setSummary(summariseOutbox(entries, userId));
      });
    reload();
    const unsubscribe = subscribeOutbox(reload);
    return () => {
      live = false;
      unsubscribe();
    };
  }, [userId]);

  useEffect(() => {
    const flush = () => void flushOutbox(userId, send, sendPhoto).catch(() => undefined);
    window.addEventListener('online', flush);
    // The browser's 'online' event misses a server that was out of reach on a live link.
    const unsubscribe = subscribeServerBack(flush);
    if (navigator.onLine) flush();
    return () => {
      window.removeEventListener('online', flush);
      unsubscribe();
    };
  }, [userId, send, sendPhoto]);

  // While some of this user's work waits, try again now and then: nothing else may call the
  // server (and so notice it is back) while they stay on one screen.
  const waits = summary.mine.records + summary.mine.photos > 0;
  useEffect(() => {
    if (!waits) return;
    const timer = window.setInterval(
      () => void flushOutbox(userId, send, sendPhoto).catch(() => undefined),
      RETRY_EVERY_MS,
    );
    return () => window.clearInterval(timer);
  }, [waits, userId, send, sendPhoto]);

  const claimUnassigned = useCallback(
    async (ids: readonly string[]) => {
      await claimOutboxEntries(ids, { id: userId, displayName, initials });
      if (navigator.onLine) await flushOutbox(userId, send, sendPhoto);
    },
    [userId, displayName, initials, send, sendPhoto],
  );

  return { summary, claimUnassigned };
}
