import { useCallback, useEffect, useState } from 'react';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import { createFieldRecord } from '../api/create-field-record';
import { uploadFieldPhoto } from '../api/upload-field-photo';
import { useOnline } from './use-online';
import { flushOutbox, type SendPhoto, type SendRecord } from './outbox-sender';
import {
  addOutboxPhotos,
  listOutbox,
  ownedBy,
  saveToOutbox,
  subscribeOutbox,
  type OutboxEntry,
  type OutboxOwner,
  type OutboxPhoto,
} from './outbox-store';

/**
 * The records `user` kept on this device and what has become of them, kept current. Sends what
 * is theirs when the page opens, when the browser says the connection is back, and after each
 * save; other people's entries are neither listed nor sent here. `online` is `useOnline`: a
 * server that did not answer counts as no connection, though the browser's link is up.
 */
export function useOutbox(
  user: OutboxOwner,
  send: SendRecord = createFieldRecord,
  sendPhoto: SendPhoto = uploadFieldPhoto,
) {
  const { id: userId, displayName, initials } = user;
  const [entries, setEntries] = useState<OutboxEntry[]>([]);
  const online = useOnline();

  useEffect(() => {
    let live = true;
    const reload = () => {
      void listOutbox().then((list) => {
        if (live) setEntries(list.filter((e) => ownedBy(e, userId)));
      });
    };
    reload();
    const unsubscribe = subscribeOutbox(reload);
    return () => {
      live = false;
      unsubscribe();
    };
  }, [userId]);

  useEffect(() => {
    const goOnline = () => void flushOutbox(userId, send, sendPhoto);
    window.addEventListener('online', goOnline);
    if (navigator.onLine) goOnline();
    return () => window.removeEventListener('online', goOnline);
  }, [userId, send, sendPhoto]);

  const save = useCallback(
    async (payload: CreateFieldRecordInput, photos: readonly OutboxPhoto[] = []) => {
      const owner = { id: userId, displayName, initials };
      const entry = await saveToOutbox(payload, owner, new Date(), photos);
      if (navigator.onLine) void flushOutbox(userId, send, sendPhoto);
      return entry;
    },
    [userId, displayName, initials, send, sendPhoto],
  );

  /** Photos added to a record already kept on the device; sent after it. */
  const addPhotos = useCallback(
    async (id: string, photos: readonly OutboxPhoto[]) => {
      await addOutboxPhotos(id, photos, userId);
      if (navigator.onLine) void flushOutbox(userId, send, sendPhoto);
    },
    [userId, send, sendPhoto],
  );

  return { entries, online, save, addPhotos, retry: () => flushOutbox(userId, send, sendPhoto) };
}

/** What the fitter reads for each state. */
export const outboxStateLabel: Record<OutboxEntry['state'], string> = {
  saved: 'Saved on this device',
  sending: 'Sending…',
  sent: 'Sent',
  refused: 'Refused by the server',
};
