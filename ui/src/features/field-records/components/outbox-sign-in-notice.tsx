import { useEffect, useState } from 'react';
import { Alert, Text } from '@mantine/core';
import { IconCloudOff, IconInfoCircle } from '@tabler/icons-react';
import { refreshSession } from '../../../lib/api-client';
import { SERVER_RETRY_MS } from '../../../lib/server-reach';
import { listOutbox, subscribeOutbox } from '../offline/outbox-store';
import {
  ownerName,
  summariseOutbox,
  waitingText,
  type OutboxSummary,
} from '../offline/outbox-summary';
import { useOnline } from '../offline/use-online';

const empty: OutboxSummary = summariseOutbox([], null);

/** What this device still holds for the server, by whose it is; nothing without IndexedDB. */
async function summarise(): Promise<OutboxSummary> {
  try {
    return summariseOutbox(await listOutbox(), null);
  } catch {
    return empty;
  }
}

/** One sentence per person (and one for unassigned entries): what waits and when it goes. */
function waitingLines(s: OutboxSummary): string[] {
  const lines = s.others.map((o) => {
    const one = o.records + o.photos === 1;
    return `${waitingText(o)} saved on this device by ${ownerName(o.owner)} ${one ? 'is' : 'are'} waiting to be sent: ${one ? 'it goes' : 'they go'} once ${o.owner.displayName} signs in.`;
  });
  const u = s.unassignedWaiting;
  if (u.records + u.photos > 0) {
    const one = u.records + u.photos === 1;
    lines.push(
      `${waitingText(u)} saved on this device before it kept who saved each entry ${one ? 'is' : 'are'} waiting (unassigned): ${one ? 'it goes' : 'they go'} once the person who made ${one ? 'it' : 'them'} signs in and confirms ${one ? 'it is' : 'they are'} theirs.`,
    );
  }
  return lines;
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
  const [summary, setSummary] = useState<OutboxSummary>(empty);

  useEffect(() => {
    let live = true;
    const reload = () =>
      void summarise().then((w) => {
        if (live) setSummary(w);
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

  // The browser may never say the connection is back (its link never went, only the server
  // did): while the server is out of reach, ask it again every few seconds.
  useEffect(() => {
    if (online) return;
    const timer = window.setInterval(() => void refreshSession(), SERVER_RETRY_MS);
    return () => window.clearInterval(timer);
  }, [online]);

  const total = [...summary.others, summary.unassignedWaiting].reduce(
    (w, o) => ({ records: w.records + o.records, photos: w.photos + o.photos }),
    { records: 0, photos: 0 },
  );
  const held = waitingText(total);
  const one = total.records + total.photos === 1;
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
            ? `Nothing saved is lost: ${held} saved on this device ${one ? 'waits' : 'wait'} here and ${one ? 'is' : 'are'} sent once the connection is back and the person who saved ${one ? 'it' : 'them'} is signed in.`
            : 'Records saved on this device stay here and are sent once the connection is back and the person who saved them is signed in.'}
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
      {waitingLines(summary).map((line) => (
        <Text size="sm" key={line}>
          {line}
        </Text>
      ))}
    </Alert>
  );
}
