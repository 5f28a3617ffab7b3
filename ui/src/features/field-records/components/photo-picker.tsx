import { useId, useRef, useState } from 'react';
import { Badge, Button, FileButton, Group, Input, Stack, Text } from '@mantine/core';
import { IconCamera } from '@tabler/icons-react';
import { MAX_ATTACHMENT_BYTES } from '@holdfast/shared';
import { formatBytes } from '../../../lib/format-bytes';
import type { OutboxPhoto } from '../offline/outbox-store';
import { MAX_PHOTOS_PER_RECORD, PHOTO_TYPES, readPhotos } from './photo-files';

const stateText: Record<OutboxPhoto['state'], { label: string; colour: string }> = {
  waiting: { label: 'On this device', colour: 'amber' },
  sent: { label: 'Sent', colour: 'pass' },
  refused: { label: 'Refused', colour: 'fail' },
};

export interface PhotoPickerProps {
  /** Every photo of the record: those kept in the outbox and those picked but not yet saved. */
  photos: readonly OutboxPhoto[];
  /** Photos not yet saved with the record, which may still be taken off. */
  unsaved: ReadonlySet<string>;
  onAdd: (photos: OutboxPhoto[]) => void;
  onRemove: (id: string) => void;
  online: boolean;
  /** No more photos (the record is signed: the server takes photos only for drafts). */
  disabled?: boolean;
}

/**
 * Photos of the work: picked files are checked as the server would check them (PNG or JPEG, the
 * upload size limit, photos per record) and a refusal names the file and the reason; the rest of
 * the form is untouched. Photos go with the record through the device's outbox.
 */
export function PhotoPicker(props: PhotoPickerProps) {
  const id = useId();
  const reset = useRef<() => void>(null);
  const [refused, setRefused] = useState<{ name: string; reason: string }[]>([]);
  const room = MAX_PHOTOS_PER_RECORD - props.photos.filter((p) => p.state !== 'refused').length;

  async function pick(files: File[]) {
    reset.current?.();
    const read = await readPhotos(files, room);
    setRefused(read.refused);
    if (read.photos.length > 0) props.onAdd(read.photos);
  }

  return (
    <Input.Wrapper
      id={id}
      label="Photos"
      description={`PNG or JPEG, up to ${formatBytes(MAX_ATTACHMENT_BYTES)} each, at most ${MAX_PHOTOS_PER_RECORD} per record. Kept on this device once the record is saved, and sent after it.`}
      error={
        refused.length > 0
          ? refused.map((r) => `${r.name} was not added: ${r.reason}`).join(' ')
          : undefined
      }
      errorProps={{ role: 'alert' }}
    >
      <Stack gap="xs" mt={4}>
        <FileButton
          multiple
          accept={PHOTO_TYPES.join(',')}
          resetRef={reset}
          disabled={props.disabled}
          onChange={(files) => void pick(files)}
          inputProps={{ id }}
        >
          {(button) => (
            <Button
              {...button}
              size="lg"
              variant="default"
              disabled={props.disabled}
              leftSection={<IconCamera size={20} aria-hidden />}
            >
              Add photos
            </Button>
          )}
        </FileButton>
        {!props.online && !props.disabled && (
          <Text size="sm">
            No connection: photos stay on this device with the record and are sent after it when the
            connection returns.
          </Text>
        )}
        {props.photos.length > 0 && (
          <Stack gap={4} component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
            {props.photos.map((p) => (
              <Group component="li" key={p.id} gap="xs" wrap="wrap" data-photo={p.name}>
                <Text size="sm" fw={600} style={{ overflowWrap: 'anywhere' }}>
                  {p.name}
                </Text>
                <Text size="sm">{formatBytes(p.size)}</Text>
                <Badge color={stateText[p.state].colour}>{stateText[p.state].label}</Badge>
                {p.state === 'refused' && p.message && (
                  <Text size="sm" c="fail.8">
                    {p.message}
                  </Text>
                )}
                {props.unsaved.has(p.id) && (
                  <Button
                    variant="subtle"
                    size="compact-md"
                    aria-label={`Take off ${p.name}`}
                    onClick={() => props.onRemove(p.id)}
                  >
                    Take off
                  </Button>
                )}
              </Group>
            ))}
          </Stack>
        )}
      </Stack>
    </Input.Wrapper>
  );
}
