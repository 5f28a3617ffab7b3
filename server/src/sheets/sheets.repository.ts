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
   * Summary rows for the given sheet ids, in that order. The small lookup tables are read by id
   * in parallel rather than joined: a seven-way join costs more to plan than to run.
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
    const [sites, machines, positions, owners] = await Promise.all([
      db
        .selectFrom('sites')
        .select(['id', 'code', 'name'])
        .where('id', 'in', uniq(sheets.map((r) => r.siteId)))
        .execute(),
      db
        .selectFrom('machines')
        .select(['id', 'tag', 'name'])
        .where('id', 'in', uniq(sheets.map((r) => r.machineId)))
        .execute(),
      db
        .selectFrom('brakePositions')
        .select(['id', 'tag', 'description'])
        .where('id', 'in', uniq(sheets.map((r) => r.positionId)))
        .execute(),
      db
        .selectFrom('users')
        .select(['id', 'displayName', 'initials'])
        .where('id', 'in', uniq(sheets.map((r) => r.ownerId)))
        .execute(),
    ]);
    const by = <T extends { id: string }>(rows: T[]) => new Map(rows.map((r) => [r.id, r]));
    const [site, machine, position, owner] = [by(sites), by(machines), by(positions), by(owners)];
    const byId = new Map(sheets.map((r) => [r.id, r]));
    return ids.flatMap((id) => {
      const r = byId.get(id);
      if (!r) return [];
      const si = site.get(r.siteId)!;
      const m = machine.get(r.machineId)!;
      const p = position.get(r.positionId)!;
      const o = owner.get(r.ownerId)!;
      return [
        {
          ...r,
          siteCode: si.code,
          siteName: si.name,
          machineTag: m.tag,
          machineName: m.name,
          positionTag: p.tag,
          positionDescription: p.description,
          ownerName: o.displayName,
          ownerInitials: o.initials,
        },
      ];
    });
  }

  /** Filters use sheets' own (denormalised) columns: the page and the count need no joins. */
  async list(query: SheetListQuery) {
    const like = query.q ? '%' + likeEscape(query.q.toLowerCase()) + '%' : undefined;
    let page = this.db.selectFrom('sheets as s').select('s.id');
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
    const [ids, total] = await Promise.all([
      page
        .orderBy(sortColumn[query.sort], query.order)
        .orderBy('s.id', query.order)
        .limit(query.pageSize)
        .offset((query.page - 1) * query.pageSize)
        .execute(),
      count.executeTakeFirstOrThrow(),
    ]);
    return { rows: await this.hydrate(ids.map((r) => r.id)), total: Number(total.n) };
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
