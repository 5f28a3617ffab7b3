import { createHash, randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import type { AttachmentRow } from '@holdfast/db';
import type { Attachment } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { AuditService } from '../audit/audit.service.js';
import { sanitizeFileName, nameForType, sniffContentType } from '../attachments/sniff.js';
import {
  ApiException,
  badRequest,
  conflict,
  forbidden,
  notFound,
} from '../common/errors/api-exception.js';
import { ObjectStorage } from '../storage/object-storage.js';
import { FieldRecordsRepository } from './field-records.repository.js';

/** Photos a record may hold; each is also bounded by the attachment size limit. */
export const MAX_PHOTOS_PER_RECORD = 20;

type People = Map<string, { id: string; displayName: string; initials: string }>;

const toAttachment = (r: AttachmentRow, people: People): Attachment => ({
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
});

/**
 * Photos of a field record go the attachments' way (sniffed by content, hashed, stored as
 * objects, downloaded through GET /api/attachments/:id/download) but belong to the record: they
 * are added while it is a draft, by its maker, and stay with it once countersigned.
 */
@Injectable()
export class FieldRecordPhotosService {
  constructor(
    private readonly repo: FieldRecordsRepository,
    private readonly storage: ObjectStorage,
    private readonly audit: AuditService,
  ) {}

  async list(recordId: string): Promise<Attachment[]> {
    if (!(await this.repo.load(recordId))) throw notFound('Field record not found.');
    const rows = await this.repo.photos(recordId);
    const people = await this.repo.people(rows.map((r) => r.uploadedBy));
    return rows.map((r) => toAttachment(r, people));
  }

  async upload(
    user: AuthUser,
    recordId: string,
    file: { originalname: string; buffer: Buffer } | undefined,
  ): Promise<Attachment> {
    if (!file) {
      throw badRequest('Some fields are not valid.', [
        { path: 'file', message: 'attach a photo in the field "file"' },
      ]);
    }
    const stored = await this.repo.load(recordId);
    if (!stored) throw notFound('Field record not found.');
    const givenName = sanitizeFileName(file.originalname);
    const contentType = sniffContentType(file.buffer, givenName);
    if (contentType !== 'image/png' && contentType !== 'image/jpeg') {
      throw new ApiException(415, 'unsupported_media_type', 'Photos are PNG or JPEG.', [
        { path: 'file', message: 'content is not a PNG or JPEG image' },
      ]);
    }
    const fileName = nameForType(givenName, contentType);
    const sha256 = createHash('sha256').update(file.buffer).digest('hex');
    const storageKey = `field-records/${recordId}/${randomUUID()}`;
    await this.storage.put(storageKey, file.buffer, contentType);
    try {
      const row = await this.repo.transaction(async (trx) => {
        const rec = await this.repo.lockForUpdate(trx, recordId);
        if (!rec) throw notFound('Field record not found.');
        if (rec.createdBy !== user.id)
          throw forbidden('Only the maker of a record adds its photos.');
        if (rec.status !== 'draft')
          throw conflict(`The record is ${rec.status}; photos go with a draft.`);
        if ((await this.repo.countPhotos(trx, recordId)) >= MAX_PHOTOS_PER_RECORD) {
          throw new ApiException(
            413,
            'payload_too_large',
            `A record holds at most ${MAX_PHOTOS_PER_RECORD} photos.`,
            [{ path: 'file', message: 'the record has no room for another photo' }],
          );
        }
        const created = await this.repo.insertPhoto(trx, {
          revisionId: rec.revisionId,
          fieldRecordId: recordId,
          fileName,
          contentType,
          size: file.buffer.length,
          sha256,
          storageKey,
          uploadedBy: user.id,
        });
        await this.audit.record(trx, {
          actorId: user.id,
          action: 'field-record.photo-added',
          entity: 'field-record',
          entityId: recordId,
          after: { fileName, contentType, size: file.buffer.length, sha256 },
        });
        return created;
      });
      return toAttachment(row, await this.repo.people([user.id]));
    } catch (e) {
      await this.storage.delete(storageKey);
      throw e;
    }
  }
}
