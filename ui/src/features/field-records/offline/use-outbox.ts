import { useCallback, useEffect, useState } from 'react';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import { createFieldRecord } from '../api/create-field-record';
import { uploadFieldPhoto } from '../api/upload-field-photo';
import { flushOutbox, type SendPhoto, type SendRecord } from './outbox-sender';
import {
  addOutboxPhotos,
  listOutbox,
  saveToOutbox,
  subscribeOutbox,
  type OutboxEntry,
  type OutboxPhoto,
} from './outbox-store';

/**
 * The records kept on this device and what has become of them, kept current. Sends what is
 * waiting when the page opens, when the browser says the connection is back, and after each save.
 */
export function useOutbox(
  send: SendRecord = createFieldRecord,
  sendPhoto: SendPhoto = uploadFieldPhoto,
) {
  const [entries, setEntries] = useState<OutboxEntry[]>([]);
  const [online, setOnline] = useState(() => navigator.onLine);

  useEffect(() => {
    let live = true;
    const reload = () => {
      void listOutbox().then((list) => {
        if (live) setEntries(list);
      });
    };
    reload();
    const unsubscribe = subscribeOutbox(reload);
    return () => {
      live = false;
      unsubscribe();
    };
  }, []);

  useEffect(() => {
    const goOnline = () => {
      setOnline(true);
      void flushOutbox(send, sendPhoto);
    };
    const goOffline = () => setOnline(false);
    window.addEventListener('online', goOnline);
    window.addEventListener('offline', goOffline);
    if (navigator.onLine) void flushOutbox(send, sendPhoto);
    return () => {
      window.removeEventListener('online', goOnline);
      window.removeEventListener('offline', goOffline);
    };
  }, [send, sendPhoto]);

  const save = useCallback(
    async (payload: CreateFieldRecordInput, photos: readonly OutboxPhoto[] = []) => {
      const entry = await saveToOutbox(payload, new Date(), photos);
      if (navigator.onLine) void flushOutbox(send, sendPhoto);
      return entry;
    },
    [send, sendPhoto],
  );

  /** Photos added to a record already kept on the device; sent after it. */
  const addPhotos = useCallback(
    async (id: string, photos: readonly OutboxPhoto[]) => {
      await addOutboxPhotos(id, photos);
      if (navigator.onLine) void flushOutbox(send, sendPhoto);
    },
    [send, sendPhoto],
  );

  return { entries, online, save, addPhotos, retry: () => flushOutbox(send, sendPhoto) };
}

/** What the fitter reads for each state. */
export const outboxStateLabel: Record<OutboxEntry['state'], string> = {
  saved: 'Saved on this device',
  sending: 'Sending…',
  sent: 'Sent',
  refused: 'Refused by the server',
};
