import { sql, type Kysely } from 'kysely';

// Acceptance-criteria sets with version history. A published version never changes.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('criteria_sets')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('description', 'text', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable('criteria_set_versions')
    .addColumn('criteria_set_id', 'text', (c) => c.notNull().references('criteria_sets.id'))
    .addColumn('version', 'integer', (c) => c.notNull())
    .addColumn('values', 'jsonb', (c) => c.notNull())
    .addColumn('note', 'text')
    .addColumn('published_by', 'uuid', (c) => c.references('users.id'))
    .addColumn('published_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint('criteria_set_versions_pkey', ['criteria_set_id', 'version'])
    .addCheckConstraint('criteria_set_versions_version_check', sql`version >= 1`)
    .execute();

  await sql`
    create or replace function criteria_set_versions_frozen() returns trigger language plpgsql as $$
    begin
      raise exception 'criteria set % version % is published and cannot change', old.criteria_set_id, old.version
        using errcode = 'HF001';
    end $$`.execute(db);
  await sql`create trigger criteria_set_versions_frozen before update or delete on criteria_set_versions
    for each row execute function criteria_set_versions_frozen()`.execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('criteria_set_versions').execute();
  await sql`drop function if exists criteria_set_versions_frozen()`.execute(db);
  await db.schema.dropTable('criteria_sets').execute();
}
