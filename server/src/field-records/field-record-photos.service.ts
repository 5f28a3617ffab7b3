import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import type { AttachmentRow, FieldRecordRow } from '@holdfast/db';
import type { Attachment } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { AuditService } from '../audit/audit.service.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { nameForType, sniffContentType } from '../attachments/sniff.js';
import {
  givenFileName,
  requireFile,
  sha256Of,
  storeThenRecord,
  toAttachment,
  type UploadedFile,
} from '../attachments/stored-file.js';
import { ApiException, conflict, forbidden, notFound } from '../common/errors/api-exception.js';
import { ObjectStorage } from '../storage/object-storage.js';
import { UsersRepository } from '../users/users.repository.js';
import { FieldRecordsRepository } from './field-records.repository.js';

/** Photos a record may hold; each is also bounded by the attachment size limit. */
export const MAX_PHOTOS_PER_RECORD = 20;

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
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
    private readonly units: UnitOfWork,
  ) {}

  async list(recordId: string): Promise<Attachment[]> {
    if (!(await this.repo.load(recordId))) throw notFound('Field record not found.');
    const rows = await this.repo.photos(recordId);
    const people = await this.users.people(rows.map((r) => r.uploadedBy));
    return rows.map((r) => toAttachment(r, people));
  }

  /**
   * Files a photo on a draft record, by its maker. The same bytes sent again for the same record
   * are answered with the photo already filed, whatever the record's state: a fitter's device
   * sends a photo again when the answer to the first send was lost, and that must not file it
   * twice.
   */
  async upload(
    user: AuthUser,
    recordId: string,
    sent: UploadedFile | undefined,
  ): Promise<Attachment> {
    const file = requireFile(sent, 'a photo');
    const stored = await this.repo.load(recordId);
    if (!stored) throw notFound('Field record not found.');
    // Checked here before the bytes are stored, and again under the row lock.
    assertMaker(user, stored.record);
    const givenName = givenFileName(file);
    const contentType = sniffContentType(file.buffer, givenName);
    if (contentType !== 'image/png' && contentType !== 'image/jpeg') {
      throw new ApiException(415, 'unsupported_media_type', 'Photos are PNG or JPEG.', [
        { path: 'file', message: 'content is not a PNG or JPEG image' },
      ]);
    }
    const sha256 = sha256Of(file.buffer);
    const filed = await this.repo.photoWithContent(recordId, sha256);
    if (filed) return this.answer(filed);
    assertDraft(stored.record);
    const fileName = nameForType(givenName, contentType);
    const storageKey = `field-records/${recordId}/${randomUUID()}`;
    const { row, again } = await storeThenRecord(
      this.storage,
      storageKey,
      file.buffer,
      contentType,
      () =>
        this.units.run(async (trx) => {
          const rec = await this.repo.lockForUpdate(trx, recordId);
          if (!rec) throw notFound('Field record not found.');
          assertMaker(user, rec);
          // Two sends of one photo at once: the second finds the first here, under the lock.
          const first = await this.repo.photoWithContent(recordId, sha256, trx);
          if (first) return { row: first, again: true };
          assertDraft(rec);
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
          return { row: created, again: false };
        }),
    );
    // The bytes stored for the second send are nobody's: the first send's row points elsewhere.
    if (again) await this.storage.delete(storageKey);
    return this.answer(row);
  }

  private async answer(row: AttachmentRow): Promise<Attachment> {
    return toAttachment(row, await this.users.people([row.uploadedBy]));
  }
}

/** Photos are added by the maker of the record… */
function assertMaker(user: AuthUser, rec: Pick<FieldRecordRow, 'createdBy'>): void {
  if (rec.createdBy !== user.id) throw forbidden('Only the maker of a record adds its photos.');
}

/** …while it is a draft. */
function assertDraft(rec: Pick<FieldRecordRow, 'status'>): void {
  if (rec.status !== 'draft')
    throw conflict(`The record is ${rec.status}; photos go with a draft.`);
}
