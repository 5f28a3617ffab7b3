import { createHash } from 'node:crypto';
import { applyDecorators, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBody, ApiConsumes } from '@nestjs/swagger';
import type { AttachmentRow } from '@holdfast/db';
import { MAX_ATTACHMENT_BYTES, type Attachment } from '@holdfast/shared';
import { memoryStorage } from 'multer';
import { badRequest } from '../common/errors/api-exception.js';
import type { ObjectStorage } from '../storage/object-storage.js';
import { sanitizeFileName } from './sniff.js';

/** What an upload route reads: one multipart file in the field "file", held in memory. */
export function FileUpload(): MethodDecorator & ClassDecorator {
  return applyDecorators(
    ApiConsumes('multipart/form-data'),
    ApiBody({
      schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } } },
    }),
    UseInterceptors(
      FileInterceptor('file', {
        storage: memoryStorage(),
        limits: { fileSize: MAX_ATTACHMENT_BYTES, files: 1 },
      }),
    ),
  );
}

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

/** The file, or a 400 naming the field when the request carried none. */
export function requireFile<F extends UploadedFile>(file: F | undefined, what: string): F {
  if (!file) {
    throw badRequest('Some fields are not valid.', [
      { path: 'file', message: `attach ${what} in the field "file"` },
    ]);
  }
  return file;
}

/** multer hands over the multipart file name decoded as latin1; recover its UTF-8 text. */
function utf8Name(name: string): string {
  if (!/[\u0080-\u00ff]/.test(name)) return name;
  const utf8 = Buffer.from(name, 'latin1').toString('utf8');
  return utf8.includes('\uFFFD') ? name : utf8;
}

/** The name the sender gave, as UTF-8 and safe to store. */
export const givenFileName = (file: UploadedFile): string =>
  sanitizeFileName(utf8Name(file.originalname));

export const sha256Of = (bytes: Buffer): string => createHash('sha256').update(bytes).digest('hex');

/**
 * Stores the object, then writes its row (`record`, a transaction); if the row cannot be written
 * the object is deleted again, so a failed upload leaves no half record.
 */
export async function storeThenRecord<T>(
  storage: ObjectStorage,
  key: string,
  bytes: Buffer,
  contentType: string,
  record: () => Promise<T>,
): Promise<T> {
  await storage.put(key, bytes, contentType);
  try {
    return await record();
  } catch (e) {
    await storage.delete(key);
    throw e;
  }
}

type People = Map<string, { id: string; displayName: string; initials: string }>;

export function toAttachment(r: AttachmentRow, people: People): Attachment {
  return {
    id: r.id,
    revisionId: r.revisionId,
    fileName: r.fileName,
    contentType: r.contentType as Attachment['contentType'],
    size: Number(r.size),
    sha256: r.sha256,
    uploadedBy: people.get(r.uploadedBy) ?? {
      id: r.uploadedBy,
      displayName: 'Unknown user',
      initials: '??',
    },
    createdAt: r.createdAt.toISOString(),
  };
}
