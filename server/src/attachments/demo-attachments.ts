import { createHash, randomUUID } from 'node:crypto';
import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ObjectStorage } from '../storage/object-storage.js';
import { AttachmentsRepository } from './attachments.repository.js';

/** Demo documents that carry a generated data sheet (see server/src/demo/demo-plant.ts). */
const DEMO_DOCUMENTS = ['HF-NRW-0005', 'HF-NRW-0006'];

/** An invented thruster data sheet as plain text (no real maker or product). */
export function demoDataSheet(documentNumber: string): string {
  return [
    'DEMO DATA SHEET - invented for the Holdfast demonstration, not a real product',
    '',
    'Electro-hydraulic thruster, model "NT-50/60" (fictitious)',
    `Attached to ${documentNumber} by the demo scenario.`,
    '',
    'quantity,value,unit',
    'rated thrust,500,N',
    'rated stroke,60,mm',
    'lift time (to 90 % stroke),0.35,s',
    'lowering time (spring return),0.30,s',
    'duty,continuous,-',
    '',
    "Values are invented. Use the maker's data sheet and the governing standard for real work.",
    '',
  ].join('\n');
}

/**
 * Adds the demo data sheet to the demo documents' latest revision once, through the object
 * storage (the database seed cannot reach it). Does nothing outside the demo.
 */
@Injectable()
export class DemoAttachments implements OnApplicationBootstrap {
  private readonly logger = new Logger('DemoAttachments');

  constructor(
    private readonly repo: AttachmentsRepository,
    private readonly storage: ObjectStorage,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    try {
      await this.ensure();
    } catch (e) {
      this.logger.warn(`demo attachments not added: ${e instanceof Error ? e.message : String(e)}`);
    }
  }

  async ensure(): Promise<number> {
    const targets = await this.repo.withoutFiles(DEMO_DOCUMENTS);
    for (const t of targets) {
      const bytes = Buffer.from(demoDataSheet(t.documentNumber), 'utf8');
      const storageKey = `revisions/${t.revisionId}/${randomUUID()}`;
      await this.storage.put(storageKey, bytes, 'text/plain');
      await this.repo.insert({
        revisionId: t.revisionId,
        fileName: 'thruster-data-sheet-demo.txt',
        contentType: 'text/plain',
        size: bytes.length,
        sha256: createHash('sha256').update(bytes).digest('hex'),
        storageKey,
        uploadedBy: t.authorId,
      });
    }
    if (targets.length)
      this.logger.log(
        `demo data sheet attached to ${targets.map((t) => t.documentNumber).join(', ')}`,
      );
    return targets.length;
  }
}
