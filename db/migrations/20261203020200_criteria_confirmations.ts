import { sql, type Kysely } from 'kysely';

// A criteria value confirmed against a document the plant holds: who, when, which document and
// clause. A confirmation is a record beside the published version (which never changes): rows
// are never updated or deleted. It covers later versions as long as the value stays the same.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('criteria_confirmations')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('criteria_set_id', 'text', (c) => c.notNull())
    .addColumn('version', 'integer', (c) => c.notNull())
    .addColumn('key', 'text', (c) => c.notNull())
    .addColumn('document', 'text', (c) => c.notNull())
    .addColumn('clause', 'text', (c) => c.notNull())
    .addColumn('confirmed_by', 'uuid', (c) => c.notNull().references('users.id'))
    .addColumn('confirmed_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addForeignKeyConstraint(
      'criteria_confirmations_version_fkey',
      ['criteria_set_id', 'version'],
      'criteria_set_versions',
      ['criteria_set_id', 'version'],
    )
    .addCheckConstraint(
      'criteria_confirmations_text_check',
      sql`length(trim(document)) > 0 and length(trim(clause)) > 0`,
    )
    .execute();
  await sql`create index criteria_confirmations_set_index
    on criteria_confirmations (criteria_set_id, key, version)`.execute(db);
  await sql`
    create or replace function criteria_confirmations_append_only() returns trigger language plpgsql as $$
    begin
      raise exception 'criteria confirmations are records and cannot change' using errcode = 'HF001';
    end $$`.execute(db);
  await sql`create trigger criteria_confirmations_append_only before update or delete
    on criteria_confirmations for each row execute function criteria_confirmations_append_only()`.execute(
    db,
  );
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('criteria_confirmations').execute();
  await sql`drop function if exists criteria_confirmations_append_only()`.execute(db);
}
