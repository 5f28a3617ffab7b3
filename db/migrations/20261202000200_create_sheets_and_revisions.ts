import { sql, type Kysely } from 'kysely';

// Sheets and their revisions. The database itself guards the record:
// - an approved or superseded revision never changes (only approved → superseded, touching the
//   superseded fields) and is never deleted;
// - an in-check revision keeps its inputs and evaluation;
// - a sheet has at most one approved and at most one open (draft/in check/returned) revision.
// A trigger keeps the sheet's latest/approved revision columns current so the list needs no joins
// into revisions.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('sheets')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('document_number', 'text', (c) => c.notNull().unique())
    .addColumn('title', 'text', (c) => c.notNull())
    .addColumn('position_id', 'uuid', (c) => c.notNull().references('brake_positions.id'))
    // Copied from the position at creation (a position never moves) so filters need no joins.
    .addColumn('machine_id', 'uuid', (c) => c.notNull().references('machines.id'))
    .addColumn('site_id', 'uuid', (c) => c.notNull().references('sites.id'))
    .addColumn('tags', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('sheet_type', 'text', (c) => c.notNull())
    .addColumn('owner_id', 'uuid', (c) => c.notNull().references('users.id'))
    .addColumn('criteria_set_id', 'text', (c) => c.notNull().references('criteria_sets.id'))
    .addColumn('latest_revision_id', 'uuid')
    .addColumn('latest_state', 'text')
    .addColumn('approved_revision_id', 'uuid')
    .addColumn('search_text', 'text', (c) =>
      c.generatedAlwaysAs(sql`lower(document_number || ' ' || title || ' ' || tags)`).stored(),
    )
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint(
      'sheets_sheet_type_check',
      sql`sheet_type in ('hoist-shoe-brake', 'travel-shoe-brake', 'caliper-disc-brake', 'disc-spring-stack')`,
    )
    .execute();
  await sql`create trigger sheets_set_updated_at before update on sheets
    for each row execute function set_updated_at()`.execute(db);
  await sql`create index sheets_search_text_index on sheets using gin (search_text gin_trgm_ops)`.execute(
    db,
  );
  for (const [name, expr] of [
    ['sheets_title_index', sql`lower(title), id`],
    ['sheets_updated_at_index', sql`updated_at, id`],
    ['sheets_latest_state_index', sql`latest_state, document_number`],
    ['sheets_site_id_index', sql`site_id, document_number`],
    ['sheets_machine_id_index', sql`machine_id`],
    ['sheets_owner_id_index', sql`owner_id, document_number`],
    ['sheets_sheet_type_index', sql`sheet_type, document_number`],
    ['sheets_position_id_index', sql`position_id`],
  ] as const) {
    await sql`create index ${sql.raw(name)} on sheets (${expr})`.execute(db);
  }

  await db.schema
    .createTable('revisions')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('sheet_id', 'uuid', (c) => c.notNull().references('sheets.id'))
    .addColumn('seq', 'integer', (c) => c.notNull())
    .addColumn('label', 'text', (c) => c.notNull())
    .addColumn('state', 'text', (c) => c.notNull().defaultTo('draft'))
    .addColumn('inputs', 'jsonb', (c) => c.notNull())
    .addColumn('unit_system', 'text', (c) => c.notNull().defaultTo('SI'))
    .addColumn('criteria_set_id', 'text', (c) => c.notNull())
    .addColumn('criteria_set_version', 'integer', (c) => c.notNull())
    .addColumn('evaluation', 'jsonb')
    .addColumn('core_version', 'text')
    .addColumn('hash', 'text')
    .addColumn('verification_code', 'text', (c) => c.unique())
    .addColumn('author_id', 'uuid', (c) => c.notNull().references('users.id'))
    .addColumn('checker_id', 'uuid', (c) => c.references('users.id'))
    .addColumn('change_note', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('justification', 'text')
    .addColumn('check_note', 'text')
    .addColumn('row_version', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('submitted_at', 'timestamptz')
    .addColumn('approved_at', 'timestamptz')
    .addColumn('returned_at', 'timestamptz')
    .addColumn('superseded_at', 'timestamptz')
    .addColumn('superseded_by_id', 'uuid', (c) => c.references('revisions.id'))
    .addForeignKeyConstraint(
      'revisions_criteria_set_version_fkey',
      ['criteria_set_id', 'criteria_set_version'],
      'criteria_set_versions',
      ['criteria_set_id', 'version'],
    )
    .addUniqueConstraint('revisions_sheet_id_seq_unique', ['sheet_id', 'seq'])
    .addUniqueConstraint('revisions_sheet_id_label_unique', ['sheet_id', 'label'])
    .addCheckConstraint(
      'revisions_state_check',
      sql`state in ('draft', 'in_check', 'returned', 'approved', 'superseded')`,
    )
    .addCheckConstraint('revisions_unit_system_check', sql`unit_system in ('SI', 'US')`)
    .addCheckConstraint('revisions_label_check', sql`label ~ '^[A-Z]{1,3}$'`)
    // A frozen revision carries everything that makes it a record.
    .addCheckConstraint(
      'revisions_frozen_complete_check',
      sql`state in ('draft', 'returned') or (evaluation is not null and hash is not null
        and core_version is not null and verification_code is not null and submitted_at is not null)`,
    )
    .addCheckConstraint(
      'revisions_approved_complete_check',
      sql`state not in ('approved', 'superseded') or (checker_id is not null and approved_at is not null
        and checker_id <> author_id)`,
    )
    .execute();
  await sql`create trigger revisions_set_updated_at before update on revisions
    for each row execute function set_updated_at()`.execute(db);
  await sql`create unique index revisions_one_approved_index on revisions (sheet_id)
    where state = 'approved'`.execute(db);
  await sql`create unique index revisions_one_open_index on revisions (sheet_id)
    where state in ('draft', 'in_check', 'returned')`.execute(db);
  await sql`create index revisions_author_id_state_index on revisions (author_id, state)`.execute(
    db,
  );
  await sql`create index revisions_state_index on revisions (state)`.execute(db);

  await sql`
    create or replace function revisions_guard() returns trigger language plpgsql as $$
    declare
      allowed text[] := array['state', 'superseded_at', 'superseded_by_id', 'row_version', 'updated_at'];
    begin
      if tg_op = 'DELETE' then
        if old.state in ('approved', 'superseded', 'in_check') then
          raise exception 'revision % is % and cannot be deleted', old.id, old.state using errcode = 'HF001';
        end if;
        return old;
      end if;
      if old.state in ('approved', 'superseded') then
        if not (old.state = 'approved' and new.state = 'superseded')
           or (to_jsonb(new) - allowed) is distinct from (to_jsonb(old) - allowed) then
          raise exception 'revision % is % and immutable', old.id, old.state using errcode = 'HF001';
        end if;
      elsif old.state = 'in_check' and
        (new.inputs, new.unit_system, new.evaluation, new.core_version, new.hash, new.verification_code,
         new.criteria_set_id, new.criteria_set_version, new.author_id, new.sheet_id, new.seq, new.label,
         new.justification, new.submitted_at)
        is distinct from
        (old.inputs, old.unit_system, old.evaluation, old.core_version, old.hash, old.verification_code,
         old.criteria_set_id, old.criteria_set_version, old.author_id, old.sheet_id, old.seq, old.label,
         old.justification, old.submitted_at) then
        raise exception 'revision % is in check; its content cannot change', old.id using errcode = 'HF001';
      end if;
      return new;
    end $$`.execute(db);
  await sql`create trigger revisions_guard before update or delete on revisions
    for each row execute function revisions_guard()`.execute(db);

  await sql`
    create or replace function revisions_sync_sheet() returns trigger language plpgsql as $$
    begin
      update sheets s set
        latest_revision_id = l.id,
        latest_state = l.state,
        approved_revision_id = (select a.id from revisions a where a.sheet_id = s.id and a.state = 'approved'),
        updated_at = now()
      from (select r.id, r.state from revisions r where r.sheet_id = new.sheet_id order by r.seq desc limit 1) l
      where s.id = new.sheet_id;
      return null;
    end $$`.execute(db);
  await sql`create trigger revisions_sync_sheet after insert or update on revisions
    for each row execute function revisions_sync_sheet()`.execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('revisions').execute();
  await sql`drop function if exists revisions_guard()`.execute(db);
  await sql`drop function if exists revisions_sync_sheet()`.execute(db);
  await db.schema.dropTable('sheets').execute();
}
