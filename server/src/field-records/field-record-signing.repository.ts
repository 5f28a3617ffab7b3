import { Injectable } from '@nestjs/common';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

/**
 * What signing a field record writes and asks: the signatures, whether a verification code is
 * free (codes are shared with revisions), the record a code names, and who hears of a signed
 * record that is out of tolerance.
 */
@Injectable()
export class FieldRecordSigningRepository {
  constructor(private readonly db: Database) {}

  async addSignature(
    row: {
      recordId: string;
      kind: 'technician' | 'countersign';
      userId: string;
      displayName: string;
      initials: string;
      note?: string;
    },
    tx: Tx,
  ): Promise<void> {
    const db = on(this.db, tx);
    await db.insertInto('fieldRecordSignatures').values(row).execute();
  }

  /** E-mail addresses of the sheet's owner and those who countersign (plant engineers, engineers). */
  async notifyEmails(ownerId: string, exceptId: string, tx?: Tx) {
    const db = on(this.db, tx);
    const rows = await db
      .selectFrom('users')
      .select('email')
      .where('active', '=', true)
      .where('id', '<>', exceptId)
      .where((eb) =>
        eb.or([eb('id', '=', ownerId), eb('role', 'in', ['viewer', 'engineer', 'checker'])]),
      )
      .orderBy('email')
      .execute();
    return rows.map((r) => r.email);
  }

  async verificationCodeTaken(code: string, tx?: Tx): Promise<boolean> {
    const db = on(this.db, tx);
    const [a, b] = await Promise.all([
      db
        .selectFrom('fieldRecords')
        .select('id')
        .where('verificationCode', '=', code)
        .executeTakeFirst(),
      db
        .selectFrom('revisions')
        .select('id')
        .where('verificationCode', '=', code)
        .executeTakeFirst(),
    ]);
    return a !== undefined || b !== undefined;
  }

  byVerificationCode(code: string) {
    return this.db
      .selectFrom('fieldRecords')
      .select('id')
      .where('verificationCode', '=', code)
      .executeTakeFirst();
  }
}
