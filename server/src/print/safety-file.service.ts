import { Injectable } from '@nestjs/common';
import { PDFDocument } from 'pdf-lib';
import type { SafetyFileInput } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { badRequest } from '../common/errors/api-exception.js';
import { RevisionsService } from '../revisions/revisions.service.js';
import { PrintService, type PrintedFile } from './print.service.js';

/**
 * Several approved sheets as one PDF for a safety file: each is rendered exactly as it prints
 * alone (its own verification code on every page) and the pages are joined in the order asked.
 * Only approved revisions go into a safety file; anything else is refused by field.
 */
@Injectable()
export class SafetyFileService {
  constructor(
    private readonly revisions: RevisionsService,
    private readonly print: PrintService,
  ) {}

  async build(user: AuthUser, input: SafetyFileInput): Promise<PrintedFile> {
    const ids = [...new Set(input.revisionIds)];
    const revisions = await Promise.all(ids.map((id) => this.revisions.get(user, id)));
    const notApproved = revisions
      .map((r, i) => ({ r, i }))
      .filter(({ r }) => r.state !== 'approved');
    if (notApproved.length > 0)
      throw badRequest(
        'Only approved revisions go into a safety file.',
        notApproved.map(({ r, i }) => ({
          path: `revisionIds.${i}`,
          message: `${r.documentNumber} rev. ${r.label} is ${r.state.replace('_', ' ')}`,
        })),
      );
    const merged = await PDFDocument.create();
    merged.setTitle('Safety file: approved brake calculation sheets');
    merged.setProducer('Holdfast');
    // One at a time: rendering is CPU-bound and each PDF is cached once rendered.
    for (const id of ids) {
      const part = await this.print.print(user, id, 'sheet', { paper: input.paper });
      const doc = await PDFDocument.load(part.bytes);
      const pages = await merged.copyPages(doc, doc.getPageIndices());
      for (const page of pages) merged.addPage(page);
    }
    const day = new Date().toISOString().slice(0, 10);
    return {
      bytes: Buffer.from(await merged.save()),
      fileName: `holdfast-safety-file-${day}-${ids.length}-sheets.pdf`,
    };
  }
}
