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

  /**
   * Summary rows for the given sheet ids, in that order: the sheets with their two revisions,
   * then the names of their sites, machines, positions and owners in one UNION ALL. A seven-way
   * join costs more to plan than to run, and each extra query costs a round trip and its
   * building in Kysely (docs/performance.md).
   */
  async hydrate(ids: string[], db: Kysely<DB> = this.db) {
    if (ids.length === 0) return [];
    const sheets = await db
      .selectFrom('sheets as s')
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
        's.siteId',
        's.machineId',
        's.positionId',
        'lr.id as latestId',
        'lr.label as latestLabel',
        'lr.state as latestState',
        'ar.id as approvedId',
        'ar.label as approvedLabel',
        'ar.approvedAt as approvedAt',
      ])
      .where('s.id', 'in', ids)
      .execute();
    if (sheets.length === 0) return [];
    const uniq = (xs: string[]) => [...new Set(xs)];
    const kind = (k: string) => sql<string>`${sql.lit(k)}::text`.as('kind');
    const names = await db
      .selectFrom('sites')
      .select(['id', kind('site'), 'code as a', 'name as b'])
      .where('id', 'in', uniq(sheets.map((r) => r.siteId)))
      .unionAll(
        db
          .selectFrom('machines')
          .select(['id', kind('machine'), 'tag as a', 'name as b'])
          .where('id', 'in', uniq(sheets.map((r) => r.machineId))),
      )
      .unionAll(
        db
          .selectFrom('brakePositions')
          .select(['id', kind('position'), 'tag as a', 'description as b'])
          .where('id', 'in', uniq(sheets.map((r) => r.positionId))),
      )
      .unionAll(
        db
          .selectFrom('users')
          .select(['id', kind('owner'), 'displayName as a', 'initials as b'])
          .where('id', 'in', uniq(sheets.map((r) => r.ownerId))),
      )
      .execute();
    const name = new Map(names.map((n) => [`${n.kind}:${n.id}`, n]));
    const byId = new Map(sheets.map((r) => [r.id, r]));
    return ids.flatMap((id) => {
      const r = byId.get(id);
      if (!r) return [];
      const si = name.get(`site:${r.siteId}`)!;
      const m = name.get(`machine:${r.machineId}`)!;
      const p = name.get(`position:${r.positionId}`)!;
      const o = name.get(`owner:${r.ownerId}`)!;
      return [
        {
          ...r,
          siteCode: si.a,
          siteName: si.b,
          machineTag: m.a,
          machineName: m.b,
          positionTag: p.a,
          positionDescription: p.b,
          ownerName: o.a,
          ownerInitials: o.b,
        },
      ];
    });
  }

  /**
   * Filters use sheets' own (denormalised) columns: the page and the count need no joins. The
   * count comes with the page (a window over the filtered rows); only a page past the end, which
   * has no row to carry it, asks for it on its own.
   */
  async list(query: SheetListQuery) {
    const like = query.q ? '%' + likeEscape(query.q.toLowerCase()) + '%' : undefined;
    let page = this.db
      .selectFrom('sheets as s')
      .select((e) => ['s.id', e.fn.countAll<string>().over().as('total')]);
    let count = this.db.selectFrom('sheets as s').select((e) => e.fn.countAll<number>().as('n'));
    if (like) {
      page = page.where(sql<boolean>`s.search_text like ${like}`);
      count = count.where(sql<boolean>`s.search_text like ${like}`);
    }
    const eq = [
      ['s.latestState', query.state],
      ['s.siteId', query.siteId],
      ['s.machineId', query.machineId],
      ['s.sheetType', query.sheetType],
      ['s.ownerId', query.ownerId],
    ] as const;
    for (const [column, value] of eq) {
      if (value === undefined) continue;
      page = page.where(column, '=', value);
      count = count.where(column, '=', value);
    }
    const ids = await page
      .orderBy(sortColumn[query.sort], query.order)
      .orderBy('s.id', query.order)
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize)
      .execute();
    const total =
      ids.length > 0
        ? Number(ids[0]!.total)
        : query.page === 1
          ? 0
          : Number((await count.executeTakeFirstOrThrow()).n);
    return { rows: await this.hydrate(ids.map((r) => r.id)), total };
  }

  async findSummary(id: string, db: Kysely<DB> = this.db) {
    return (await this.hydrate([id], db))[0];
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
