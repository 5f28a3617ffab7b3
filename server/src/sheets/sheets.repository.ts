import { Injectable } from '@nestjs/common';
import { sql, type CompiledQuery, type SelectQueryBuilder } from 'kysely';
import type { DB } from '@holdfast/db';
import type { SheetListQuery } from '@holdfast/shared';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';
import { summaryColumns } from './sheet-summary.sql.js';

/** A query on `sheets as s` that the list's filters can narrow. */
type FilterableSheets<T> = SelectQueryBuilder<DB & { s: DB['sheets'] }, 's', T>;

interface ListedPage {
  total: string | null;
  items: string | null;
}

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
  async hydrate(ids: string[], tx?: Tx) {
    if (ids.length === 0) return [];
    const db = on(this.db, tx);
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
   * One page of the register as JSON text built by PostgreSQL, in the shape of `SheetSummary`
   * (the same keys in the same order as `toSheetSummary`), with the total. Filters use sheets'
   * own (denormalised) columns, so the page and the count need no joins; the total comes with the
   * page (a window over the filtered rows) and only a page past the end asks for it on its own.
   * The names come from one-row look-ups per sheet rather than joins: a seven-way join took
   * PostgreSQL about 3 ms to plan, and building 25 summaries in the server (three queries,
   * their rows, dates and objects, then `JSON.stringify`) cost more than the rest of the request
   * (docs/performance.md, "Under load").
   */
  async listJson(query: SheetListQuery): Promise<{ total: number; items: string }> {
    const like = query.q ? '%' + likeEscape(query.q.toLowerCase()) + '%' : undefined;
    const filters = [
      like,
      query.state,
      query.siteId,
      query.machineId,
      query.sheetType,
      query.ownerId,
    ];
    const parameters = [
      ...filters.filter((v) => v !== undefined),
      query.pageSize,
      (query.page - 1) * query.pageSize,
    ];
    // Building the statement in Kysely cost about a tenth of the request: it is built once per
    // shape (sort, order, which filters are set) and run with this request's values.
    const shape = `${query.sort} ${query.order} ${filters.map((v) => (v === undefined ? 0 : 1)).join('')}`;
    let statement = this.listStatements.get(shape);
    if (!statement) {
      statement = this.listStatement(query, like);
      // The values must sit where the builder put them; a change to the builder fails here.
      if (JSON.stringify(statement.parameters) !== JSON.stringify(parameters))
        throw new Error(`sheet list parameters out of order for ${shape}`);
      this.listStatements.set(shape, statement);
    }
    const listed: CompiledQuery<ListedPage> = { ...statement, parameters };
    // A search is planned each time: a generic plan cannot see the pattern.
    const row = like
      ? (await this.db.executeQuery(listed)).rows[0]
      : (await this.db.executePrepared<ListedPage>(listed))[0];
    if (row?.total != null) return { total: Number(row.total), items: `[${row.items ?? ''}]` };
    const total = query.page === 1 ? 0 : await this.countListed(query, like);
    return { total, items: '[]' };
  }

  /** Compiled sheet-list statements by shape: at most 4 sorts × 2 orders × 64 filter sets. */
  private readonly listStatements = new Map<string, CompiledQuery<ListedPage>>();

  private filtered<T>(query: SheetListQuery, like: string | undefined, qb: FilterableSheets<T>) {
    if (like) qb = qb.where(sql<boolean>`s.search_text like ${like}`);
    const eq = [
      ['s.latestState', query.state],
      ['s.siteId', query.siteId],
      ['s.machineId', query.machineId],
      ['s.sheetType', query.sheetType],
      ['s.ownerId', query.ownerId],
    ] as const;
    for (const [column, value] of eq) {
      if (value !== undefined) qb = qb.where(column, '=', value);
    }
    return qb;
  }

  private listStatement(query: SheetListQuery, like: string | undefined) {
    const order = sql.raw(query.order);
    const sort = sortColumn[query.sort];
    const sortKey = typeof sort === 'string' ? sql.ref(sort) : sort;
    const page = this.filtered(
      query,
      like,
      this.db
        .selectFrom('sheets as s')
        .select((e) => [
          's.id',
          e.fn.countAll<string>().over().as('total'),
          sql<string>`row_number() over (order by ${sortKey} ${order}, s.id ${order})`.as('ord'),
        ]),
    )
      .orderBy(sort, query.order)
      .orderBy('s.id', query.order)
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize);
    return sql<ListedPage>`
      with page as (${page})
      select max(p.total) as total, string_agg(row_to_json(r)::text, ',' order by p.ord) as items
      from page p
      join sheets s on s.id = p.id
      cross join lateral (${summaryColumns}) r`.compile(this.db);
  }

  /** The total alone, for a page past the end (no row to carry it). */
  private async countListed(query: SheetListQuery, like: string | undefined) {
    const count = this.filtered(
      query,
      like,
      this.db.selectFrom('sheets as s').select((e) => e.fn.countAll<number>().as('n')),
    );
    return Number((await count.executeTakeFirstOrThrow()).n);
  }

  async findSummary(id: string, tx?: Tx) {
    return (await this.hydrate([id], tx))[0];
  }
}

export type SheetSummaryRow = NonNullable<Awaited<ReturnType<SheetsRepository['findSummary']>>>;
