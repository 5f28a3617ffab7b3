import { Injectable } from '@nestjs/common';
import { sql, type Kysely } from 'kysely';
import type { DB } from '@holdfast/db';
import type { SheetListQuery } from '@holdfast/shared';
import { Database } from '../database/database.js';

const sortColumn = {
  documentNumber: 's.documentNumber',
  title: sql`lower(s.title)`,
  updatedAt: 's.updatedAt',
  state: 's.latestState',
} as const;

/** Escape LIKE wildcards so a search for "50%" means the text "50%". */
const likeEscape = (q: string) => q.replace(/[\\%_]/g, (c) => `\\${c}`);

@Injectable()
export class SheetsRepository {
  constructor(private readonly db: Database) {}

  private summaryQuery(db: Kysely<DB> = this.db) {
    return db
      .selectFrom('sheets as s')
      .innerJoin('sites as site', 'site.id', 's.siteId')
      .innerJoin('machines as m', 'm.id', 's.machineId')
      .innerJoin('brakePositions as p', 'p.id', 's.positionId')
      .innerJoin('users as o', 'o.id', 's.ownerId')
      .innerJoin('revisions as lr', 'lr.id', 's.latestRevisionId')
      .leftJoin('revisions as ar', 'ar.id', 's.approvedRevisionId')
      .select([
        's.id',
        's.documentNumber',
        's.title',
        's.sheetType',
        's.updatedAt',
        's.criteriaSetId',
        's.ownerId',
        'site.id as siteId',
        'site.code as siteCode',
        'site.name as siteName',
        'm.id as machineId',
        'm.tag as machineTag',
        'm.name as machineName',
        'p.id as positionId',
        'p.tag as positionTag',
        'p.description as positionDescription',
        'o.displayName as ownerName',
        'o.initials as ownerInitials',
        'lr.id as latestId',
        'lr.label as latestLabel',
        'lr.state as latestState',
        'ar.id as approvedId',
        'ar.label as approvedLabel',
        'ar.approvedAt as approvedAt',
      ]);
  }

  async list(query: SheetListQuery) {
    let q = this.summaryQuery();
    if (query.q)
      q = q.where(
        sql<boolean>`s.search_text like ${'%' + likeEscape(query.q.toLowerCase()) + '%'}`,
      );
    if (query.state) q = q.where('s.latestState', '=', query.state);
    if (query.siteId) q = q.where('s.siteId', '=', query.siteId);
    if (query.machineId) q = q.where('s.machineId', '=', query.machineId);
    if (query.sheetType) q = q.where('s.sheetType', '=', query.sheetType);
    if (query.ownerId) q = q.where('s.ownerId', '=', query.ownerId);
    const rows = await q
      .select(sql<number>`count(*) over ()`.as('total'))
      .orderBy(sortColumn[query.sort], query.order)
      .orderBy('s.id', query.order)
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize)
      .execute();
    let total = rows[0]?.total;
    if (total === undefined) {
      // Past the last page: count separately so the client still learns the total.
      let c = this.db.selectFrom('sheets as s').select((e) => e.fn.countAll<number>().as('n'));
      if (query.q)
        c = c.where(
          sql<boolean>`s.search_text like ${'%' + likeEscape(query.q.toLowerCase()) + '%'}`,
        );
      if (query.state) c = c.where('s.latestState', '=', query.state);
      if (query.siteId) c = c.where('s.siteId', '=', query.siteId);
      if (query.machineId) c = c.where('s.machineId', '=', query.machineId);
      if (query.sheetType) c = c.where('s.sheetType', '=', query.sheetType);
      if (query.ownerId) c = c.where('s.ownerId', '=', query.ownerId);
      total = Number((await c.executeTakeFirstOrThrow()).n);
    }
    return { rows, total: Number(total) };
  }

  findSummary(id: string, db: Kysely<DB> = this.db) {
    return this.summaryQuery(db).where('s.id', '=', id).executeTakeFirst();
  }

  /** Position with its machine and site, for creating a sheet. */
  findPosition(positionId: string, db: Kysely<DB>) {
    return db
      .selectFrom('brakePositions as p')
      .innerJoin('machines as m', 'm.id', 'p.machineId')
      .innerJoin('sites as site', 'site.id', 'm.siteId')
      .select(['p.id', 'p.tag', 'm.id as machineId', 'm.tag as machineTag', 'site.id as siteId'])
      .where('p.id', '=', positionId)
      .executeTakeFirst();
  }

  /** Next document number of a site, e.g. HF-NRW-0007; serialised by the site row lock. */
  async nextDocumentNumber(siteId: string, db: Kysely<DB>): Promise<string> {
    const row = await db
      .updateTable('sites')
      .set((eb) => ({ nextSheetNumber: eb('nextSheetNumber', '+', 1) }))
      .where('id', '=', siteId)
      .returning(['code', 'nextSheetNumber'])
      .executeTakeFirstOrThrow();
    return `HF-${row.code}-${String(row.nextSheetNumber - 1).padStart(4, '0')}`;
  }
}

export type SheetSummaryRow = NonNullable<Awaited<ReturnType<SheetsRepository['findSummary']>>>;
