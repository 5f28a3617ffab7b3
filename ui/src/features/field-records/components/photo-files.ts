import { MAX_ATTACHMENT_BYTES } from '@holdfast/shared';
import { formatBytes } from '../../../lib/format-bytes';
import type { OutboxPhoto } from '../offline/outbox-store';

/** What the server stores as a photo of a record (it sniffs the bytes; the name decides nothing). */
export const PHOTO_TYPES = ['image/png', 'image/jpeg'] as const;

/** The server's limit on photos per record (field-record-photos.service.ts). */
export const MAX_PHOTOS_PER_RECORD = 20;

/** Why the server would refuse this file, in its own words, or null when it would take it. */
export function photoRefusal(file: Pick<File, 'type' | 'size'>): string | null {
  if (!(PHOTO_TYPES as readonly string[]).includes(file.type)) return 'Photos are PNG or JPEG.';
  if (file.size > MAX_ATTACHMENT_BYTES)
    return `The file is too large (limit ${formatBytes(MAX_ATTACHMENT_BYTES)} per file).`;
  return null;
}

function readBytes(file: File): Promise<ArrayBuffer> {
  // FileReader rather than file.arrayBuffer(): older tablet browsers lack the latter.
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(reader.result as ArrayBuffer);
    reader.onerror = () => reject(reader.error ?? new Error('the file could not be read'));
    reader.readAsArrayBuffer(file);
  });
}

/**
 * The files picked, split into photos ready to keep with the record and refusals (file name
 * and reason); `room` is how many more photos the record may hold.
 */
export async function readPhotos(
  files: readonly File[],
  room: number,
): Promise<{ photos: OutboxPhoto[]; refused: { name: string; reason: string }[] }> {
  const photos: OutboxPhoto[] = [];
  const refused: { name: string; reason: string }[] = [];
  for (const file of files) {
    const reason =
      photoRefusal(file) ??
      (photos.length >= room ? `A record holds at most ${MAX_PHOTOS_PER_RECORD} photos.` : null);
    if (reason) {
      refused.push({ name: file.name, reason });
      continue;
    }
    try {
      photos.push({
        id: crypto.randomUUID(),
        name: file.name,
        type: file.type,
        size: file.size,
        bytes: await readBytes(file),
        state: 'waiting',
      });
    } catch (error) {
      refused.push({ name: file.name, reason: error instanceof Error ? error.message : 'unread' });
    }
  }
  return { photos, refused };
}
