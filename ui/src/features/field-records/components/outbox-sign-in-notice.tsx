import { useEffect, useState } from 'react';
import { Alert, Text } from '@mantine/core';
import { IconCloudOff, IconInfoCircle } from '@tabler/icons-react';
import { refreshSession } from '../../../lib/api-client';
import { listOutbox, subscribeOutbox, waitingPhotos } from '../offline/outbox-store';
import { useOnline } from '../offline/use-online';

interface Waiting {
  records: number;
  photos: number;
}

/** What this device still holds for the server; nothing when it has no IndexedDB. */
async function countWaiting(): Promise<Waiting> {
  try {
    const entries = await listOutbox();
    return {
      records: entries.filter((e) => e.state !== 'sent').length,
      photos: entries.reduce((n, e) => n + waitingPhotos(e).length, 0),
    };
  } catch {
    return { records: 0, photos: 0 };
  }
}

function plural(n: number, one: string, many: string): string {
  return n === 1 ? `1 ${one}` : `${n} ${many}`;
}

function waitingText(w: Waiting): string {
  const parts = [
    w.records > 0 ? plural(w.records, 'field record', 'field records') : null,
    w.photos > 0 ? plural(w.photos, 'photo', 'photos') : null,
  ].filter(Boolean);
  return parts.join(' and ');
}

/**
 * On the sign-in page: a page reloaded without a connection cannot sign in again (the session
 * lives in memory and is renewed from the server), so this says what became of the fitter's
 * work: records and photos saved on the device stay there and are sent once the connection is
 * back and someone is signed in. When the connection returns it tries the session cookie at
 * once, which brings the fitter back to the page they were on without typing a password.
 */
export function OutboxSignInNotice({ returnsTo }: { returnsTo: string }) {
  const online = useOnline();
  const [waiting, setWaiting] = useState<Waiting>({ records: 0, photos: 0 });

  useEffect(() => {
    let live = true;
    const reload = () =>
      void countWaiting().then((w) => {
        if (live) setWaiting(w);
      });
    reload();
    const unsubscribe = subscribeOutbox(reload);
    return () => {
      live = false;
      unsubscribe();
    };
  }, []);

  useEffect(() => {
    const back = () => void refreshSession();
    window.addEventListener('online', back);
    return () => window.removeEventListener('online', back);
  }, []);

  const held = waitingText(waiting);
  const one = waiting.records + waiting.photos === 1;
  const toRecord = returnsTo.startsWith('/field-records/');
  if (!online) {
    return (
      <Alert
        color="amber"
        variant="light"
        icon={<IconCloudOff aria-hidden />}
        title="No connection"
        data-testid="offline-notice"
      >
        <Text size="sm">
          Signing in needs the connection, so this page cannot open
          {toRecord ? ' the record form' : ' the workbench'} until it returns.
        </Text>
        <Text size="sm" mt={4}>
          {held
            ? `Nothing saved is lost: ${held} saved on this device ${one ? 'waits' : 'wait'} here and ${one ? 'is' : 'are'} sent once the connection is back and you are signed in.`
            : 'Records saved on this device stay here and are sent once the connection is back and you are signed in.'}
          {toRecord ? ' What you typed on the record form is kept on this device as well.' : ''}
        </Text>
        <Text size="sm" mt={4}>
          When the connection returns, this page signs you back in if your session is still valid
          and takes you back{toRecord ? ' to the record form' : ''}; otherwise sign in here.
        </Text>
      </Alert>
    );
  }
  if (!held) return null;
  return (
    <Alert
      color="steel"
      variant="light"
      icon={<IconInfoCircle aria-hidden />}
      data-testid="outbox-notice"
    >
      {`${held} saved on this device ${one ? 'is' : 'are'} waiting to be sent: ${one ? 'it goes' : 'they go'} once you sign in.`}
    </Alert>
  );
}
