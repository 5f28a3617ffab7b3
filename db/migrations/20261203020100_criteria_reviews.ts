import { sql, type Kysely } from 'kysely';

// "Under review" annotations beside approved revisions. When a new criteria-set version makes an
// approved revision fail, a row here says so; the revision itself is never touched (it stays
// immutable). A flag clears when a newer revision of the sheet is approved, or when a checker
// writes a disposition ("reviewed, stands because ..."). A cleared flag is a record: it never
// changes again and no flag is ever deleted.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('criteria_reviews')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('revision_id', 'uuid', (c) => c.notNull().references('revisions.id'))
    .addColumn('sheet_id', 'uuid', (c) => c.notNull().references('sheets.id'))
    .addColumn('criteria_set_id', 'text', (c) => c.notNull())
    .addColumn('criteria_set_version', 'integer', (c) => c.notNull())
    // The checks that fail under that version: [{ id, label, value, limit, unit }].
    .addColumn('failing', 'jsonb', (c) => c.notNull())
    .addColumn('flagged_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('cleared_at', 'timestamptz')
    .addColumn('cleared_by', 'uuid', (c) => c.references('users.id'))
    .addColumn('cleared_how', 'text')
    .addColumn('disposition', 'text')
    .addForeignKeyConstraint(
      'criteria_reviews_criteria_set_version_fkey',
      ['criteria_set_id', 'criteria_set_version'],
      'criteria_set_versions',
      ['criteria_set_id', 'version'],
    )
    .addCheckConstraint(
      'criteria_reviews_cleared_check',
      sql`(cleared_at is null and cleared_by is null and cleared_how is null and disposition is null)
        or (cleared_at is not null and cleared_how = 'superseded')
        or (cleared_at is not null and cleared_how = 'disposition' and cleared_by is not null
            and length(trim(disposition)) >= 10)`,
    )
    .execute();
  await sql`create unique index criteria_reviews_one_open_index on criteria_reviews (revision_id)
    where cleared_at is null`.execute(db);
  await sql`create index criteria_reviews_sheet_id_index on criteria_reviews (sheet_id, flagged_at)`.execute(
    db,
  );

  await sql`
    create or replace function criteria_reviews_guard() returns trigger language plpgsql as $$
    begin
      if tg_op = 'DELETE' then
        raise exception 'review flag % is a record and cannot be deleted', old.id using errcode = 'HF001';
      end if;
      if old.cleared_at is not null then
        raise exception 'review flag % is cleared and cannot change', old.id using errcode = 'HF001';
      end if;
      if (new.revision_id, new.sheet_id, new.criteria_set_id, new.flagged_at)
          is distinct from (old.revision_id, old.sheet_id, old.criteria_set_id, old.flagged_at) then
        raise exception 'review flag % keeps its revision and date', old.id using errcode = 'HF001';
      end if;
      return new;
    end $$`.execute(db);
  await sql`create trigger criteria_reviews_guard before update or delete on criteria_reviews
    for each row execute function criteria_reviews_guard()`.execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('criteria_reviews').execute();
  await sql`drop function if exists criteria_reviews_guard()`.execute(db);
}
