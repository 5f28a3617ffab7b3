import { sql, type Kysely } from 'kysely';

// Frozen in time: no application imports. The light equipment register a sheet hangs on:
// site → machine → brake position.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await sql`create extension if not exists pg_trgm`.execute(db);

  await db.schema
    .createTable('sites')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('code', 'text', (c) => c.notNull().unique())
    .addColumn('name', 'text', (c) => c.notNull())
    // Next document number for sheets of this site (HF-<code>-<n>); bumped under a row lock.
    .addColumn('next_sheet_number', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('sites_code_check', sql`code ~ '^[A-Z0-9]{2,6}$'`)
    .execute();

  await db.schema
    .createTable('machines')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('site_id', 'uuid', (c) => c.notNull().references('sites.id'))
    .addColumn('tag', 'text', (c) => c.notNull())
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint('machines_site_id_tag_unique', ['site_id', 'tag'])
    .addCheckConstraint(
      'machines_kind_check',
      sql`kind in ('crane', 'conveyor', 'mill-auxiliary', 'winch', 'other')`,
    )
    .execute();

  await db.schema
    .createTable('brake_positions')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('machine_id', 'uuid', (c) => c.notNull().references('machines.id'))
    .addColumn('tag', 'text', (c) => c.notNull())
    .addColumn('description', 'text', (c) => c.notNull())
    .addColumn('motion', 'text', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint('brake_positions_machine_id_tag_unique', ['machine_id', 'tag'])
    .addCheckConstraint(
      'brake_positions_motion_check',
      sql`motion in ('hoist', 'auxiliary-hoist', 'trolley', 'bridge', 'travel', 'conveyor', 'slew', 'other')`,
    )
    .execute();
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('brake_positions').execute();
  await db.schema.dropTable('machines').execute();
  await db.schema.dropTable('sites').execute();
  await sql`drop extension if exists pg_trgm`.execute(db);
}
