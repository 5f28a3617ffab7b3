import { useCallback, useEffect, useState } from 'react';
import type { CreateFieldRecordInput } from '@holdfast/shared';
import { createFieldRecord } from '../api/create-field-record';
import { flushOutbox, type SendRecord } from './outbox-sender';
import { listOutbox, saveToOutbox, subscribeOutbox, type OutboxEntry } from './outbox-store';

/**
 * The records kept on this device and what has become of them, kept current. Sends what is
 * waiting when the page opens, when the browser says the connection is back, and after each save.
 */
export function useOutbox(send: SendRecord = createFieldRecord) {
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
      void flushOutbox(send);
    };
    const goOffline = () => setOnline(false);
    window.addEventListener('online', goOnline);
    window.addEventListener('offline', goOffline);
    if (navigator.onLine) void flushOutbox(send);
    return () => {
      window.removeEventListener('online', goOnline);
      window.removeEventListener('offline', goOffline);
    };
  }, [send]);

  const save = useCallback(
    async (payload: CreateFieldRecordInput) => {
      const entry = await saveToOutbox(payload);
      if (navigator.onLine) void flushOutbox(send);
      return entry;
    },
    [send],
  );

  return { entries, online, save, retry: () => flushOutbox(send) };
}

/** What the fitter reads for each state. */
export const outboxStateLabel: Record<OutboxEntry['state'], string> = {
  saved: 'Saved on this device',
  sending: 'Sending…',
  sent: 'Sent',
  refused: 'Refused by the server',
};
