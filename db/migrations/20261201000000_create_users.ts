import { sql, type Kysely } from 'kysely';

// Frozen in time: no application imports. Names are snake_case (see db/src/database.ts).
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  // Shared by later tables: `create trigger <t>_set_updated_at before update on <t>
  // for each row execute function set_updated_at()`.
  await sql`
    create or replace function set_updated_at() returns trigger language plpgsql as $$
    begin
      new.updated_at := now();
      return new;
    end $$`.execute(db);

  await db.schema
    .createTable('users')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('email', 'text', (c) => c.notNull())
    .addColumn('display_name', 'text', (c) => c.notNull())
    .addColumn('initials', 'text', (c) => c.notNull())
    .addColumn('role', 'text', (c) => c.notNull())
    .addColumn('password_hash', 'text', (c) => c.notNull())
    .addColumn('active', 'boolean', (c) => c.notNull().defaultTo(true))
    .addColumn('unit_system', 'text', (c) => c.notNull().defaultTo('SI'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('users_role_check', sql`role in ('engineer', 'checker', 'viewer', 'admin')`)
    .addCheckConstraint('users_unit_system_check', sql`unit_system in ('SI', 'US')`)
    .addCheckConstraint('users_email_lower_check', sql`email = lower(email)`)
    .addCheckConstraint('users_initials_check', sql`initials ~ '^[A-Z]{2,4}$'`)
    .execute();
  await db.schema
    .createIndex('users_email_index')
    .on('users')
    .unique()
    .expression(sql`lower(email)`)
    .execute();
  await sql`create trigger users_set_updated_at before update on users
    for each row execute function set_updated_at()`.execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('users').execute();
  await sql`drop function if exists set_updated_at()`.execute(db);
}
