import { Button, SimpleGrid, Text } from '@mantine/core';
import { errorMessage } from '../../../lib/api-client';
import type { useSignFieldRecord } from '../../../features/field-records/api/sign-field-record';
import { OutboxStatus } from '../../../features/field-records/components/outbox-status';
import {
  waitingPhotos,
  type OutboxEntry,
} from '../../../features/field-records/offline/outbox-store';

/** Where the record stands on the device, and save, sign or start another as it allows. */
export function RecordActions(props: {
  entry: OutboxEntry | undefined;
  online: boolean;
  sign: ReturnType<typeof useSignFieldRecord>;
  onSave: () => void;
  onStartAnother: () => void;
  /** Changes made on the form after the server had the record (it signs what it stores). */
  changes?: { pending: boolean; saving: boolean; error: unknown; onSave: () => void };
}) {
  const { entry, online, sign, changes } = props;
  const sent = entry?.state === 'sent';
  const photosWaiting = waitingPhotos(entry).length;
  const unsaved = sent && !sign.isSuccess && (changes?.pending ?? false);
  return (
    <>
      {entry && <OutboxStatus entry={entry} online={online} />}
      {/* One button a row on a phone, so neither label is cut off. */}
      <SimpleGrid cols={{ base: 1, sm: sent ? 2 : 1 }} spacing="xs">
        {!sent && (
          <Button size="lg" onClick={props.onSave}>
            Save record
          </Button>
        )}
        {unsaved && (
          <Button size="lg" loading={changes?.saving} disabled={!online} onClick={changes?.onSave}>
            Save changes
          </Button>
        )}
        {sent && (
          <Button
            size="lg"
            loading={sign.isPending}
            disabled={!online || sign.isSuccess || photosWaiting > 0 || unsaved}
            onClick={() => sign.mutate({ id: entry.id })}
          >
            {sign.isSuccess ? 'Signed' : 'Sign the record'}
          </Button>
        )}
        {sent && (
          <Button size="lg" variant="default" onClick={props.onStartAnother}>
            Start another record
          </Button>
        )}
      </SimpleGrid>
      {sent && photosWaiting > 0 && !sign.isSuccess && (
        <Text size="sm">
          {photosWaiting === 1 ? '1 photo is' : `${photosWaiting} photos are`} still to be sent:
          sign once they are on the server, as a signed record takes no more photos.
        </Text>
      )}
      {unsaved && (
        <Text size="sm" data-testid="unsaved-changes">
          {online
            ? 'Changed since it was saved: save the changes before signing, as the record is signed as stored.'
            : 'Changed since it was saved: connect to save the changes; the record is signed as stored.'}
        </Text>
      )}
      {changes?.error ? <Text c="fail.8">{errorMessage(changes.error)}</Text> : null}
      {sign.isError && <Text c="fail.8">{errorMessage(sign.error)}</Text>}
    </>
  );
}
