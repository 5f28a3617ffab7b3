import { randomUUID } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import type { Attachment } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { ApiException, notFound } from '../common/errors/api-exception.js';
import { UnitOfWork, type Tx } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { RevisionsRepository } from '../revisions/revisions.repository.js';
import { RevisionsService } from '../revisions/revisions.service.js';
import { ObjectStorage } from '../storage/object-storage.js';
import { AppConfig } from '../config/app-config.js';
import { nameForType, sniffContentType } from './sniff.js';
import {
  givenFileName,
  requireFile,
  sha256Of,
  storeThenRecord,
  toAttachment,
  type UploadedFile,
} from './stored-file.js';
import { UsersRepository } from '../users/users.repository.js';
import { AttachmentsRepository } from './attachments.repository.js';

@Injectable()
export class AttachmentsService {
  private readonly logger = new Logger('Attachments');

  constructor(
    private readonly repo: AttachmentsRepository,
    private readonly units: UnitOfWork,
    private readonly storage: ObjectStorage,
    private readonly revisions: RevisionsService,
    private readonly revisionsRepo: RevisionsRepository,
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
    private readonly config: AppConfig,
  ) {}

  async list(user: AuthUser, revisionId: string): Promise<Attachment[]> {
    await this.revisions.load(user, revisionId);
    const rows = await this.repo.listForRevision(revisionId);
    const people = await this.users.people(rows.map((r) => r.uploadedBy));
    return rows.map((r) => toAttachment(r, people));
  }

  /** Sniff, hash, store the object, then write the row (stored-file.ts). */
  async upload(
    user: AuthUser,
    revisionId: string,
    sent: UploadedFile | undefined,
  ): Promise<Attachment> {
    const file = requireFile(sent, 'a file');
    const rev = await this.revisions.load(user, revisionId);
    this.revisions.assertEditable(user, rev, rev.rowVersion);
    await this.assertQuota(revisionId, file.buffer.length);
    const givenName = givenFileName(file);
    const contentType = sniffContentType(file.buffer, givenName);
    if (!contentType) {
      throw new ApiException(
        415,
        'unsupported_media_type',
        'Only PDF, PNG, JPEG and plain text or CSV files are accepted (judged by their content).',
        [{ path: 'file', message: 'content is not PDF, PNG, JPEG or UTF-8 text' }],
      );
    }
    const fileName = nameForType(givenName, contentType);
    const sha256 = sha256Of(file.buffer);
    const storageKey = `revisions/${revisionId}/${randomUUID()}`;
    const row = await storeThenRecord(this.storage, storageKey, file.buffer, contentType, () =>
      this.units.run(async (tx) => {
        // The revision row lock serialises uploads to one revision, so the quota holds under races.
        await this.repo.lockRevision(revisionId, tx);
        await this.assertQuota(revisionId, file.buffer.length, tx);
        const created = await this.repo.insert(
          {
            revisionId,
            fileName,
            contentType,
            size: file.buffer.length,
            sha256,
            storageKey,
            uploadedBy: user.id,
          },
          tx,
        );
        await this.audit.record(tx, {
          actorId: user.id,
          action: 'attachment.uploaded',
          entity: 'attachment',
          entityId: created.id,
          sheetId: rev.sheetId,
          after: { revision: rev.label, fileName, contentType, size: file.buffer.length, sha256 },
        });
        return created;
      }),
    );
    return toAttachment(row, await this.users.people([user.id]));
  }

  /** Refuses an upload that would take the revision past its file count or byte quota. */
  private async assertQuota(revisionId: string, adding: number, tx?: Tx): Promise<void> {
    const { ATTACHMENTS_PER_REVISION: maxFiles, ATTACHMENT_MB_PER_REVISION: maxMb } =
      this.config.settings;
    const { files, bytes } = await this.repo.usage(revisionId, tx);
    const maxBytes = maxMb * 1024 * 1024;
    if (files + 1 > maxFiles || bytes + adding > maxBytes) {
      throw new ApiException(
        413,
        'payload_too_large',
        `A revision holds at most ${maxFiles} files and ${maxMb} MB in all; this one has ${files} files and ${(bytes / 1024 / 1024).toFixed(1)} MB.`,
        [{ path: 'file', message: 'the revision has no room for this file' }],
        { maxFiles, maxBytes, files, bytes },
      );
    }
  }

  /** The bytes, checked against the stored SHA-256. */
  async download(user: AuthUser, id: string): Promise<{ attachment: Attachment; bytes: Buffer }> {
    const row = await this.repo.find(id);
    if (!row) throw notFound('Attachment not found.');
    await this.revisions.load(user, row.revisionId);
    const bytes = await this.storage.get(row.storageKey);
    if (!bytes) {
      this.logger.error(`attachment ${id}: object ${row.storageKey} is missing from storage`);
      throw new ApiException(
        500,
        'internal_error',
        'The stored file is missing. It has been logged.',
        undefined,
        {
          reason: 'object_missing',
        },
      );
    }
    const actual = sha256Of(bytes);
    if (actual !== row.sha256) {
      this.logger.error(
        `attachment ${id}: checksum mismatch (stored ${row.sha256}, read ${actual})`,
      );
      throw new ApiException(
        500,
        'internal_error',
        'The stored file does not match its checksum. It has been logged.',
        undefined,
        {
          reason: 'checksum_mismatch',
        },
      );
    }
    return { attachment: toAttachment(row, new Map()), bytes };
  }
}
