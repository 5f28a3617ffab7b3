import { sql, type Kysely } from 'kysely';

// The audit trail is append-only: a trigger refuses UPDATE and DELETE of any row.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('audit_events')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('at', 'timestamptz', (c) => c.notNull().defaultTo(sql`clock_timestamp()`))
    .addColumn('actor_id', 'uuid', (c) => c.references('users.id'))
    .addColumn('action', 'text', (c) => c.notNull())
    .addColumn('entity', 'text', (c) => c.notNull())
    .addColumn('entity_id', 'text', (c) => c.notNull())
    .addColumn('sheet_id', 'uuid')
    .addColumn('before', 'jsonb')
    .addColumn('after', 'jsonb')
    .execute();
  await sql`create index audit_events_sheet_id_index on audit_events (sheet_id, at)`.execute(db);
  await sql`create index audit_events_entity_index on audit_events (entity, entity_id, at)`.execute(
    db,
  );
  await sql`
    create or replace function audit_events_append_only() returns trigger language plpgsql as $$
    begin
      raise exception 'audit events are append-only' using errcode = 'HF001';
    end $$`.execute(db);
  await sql`create trigger audit_events_append_only before update or delete on audit_events
    for each row execute function audit_events_append_only()`.execute(db);

  await db.schema
    .createTable('outbox')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('payload', 'jsonb', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('attempts', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('last_error', 'text')
    .addColumn('sent_at', 'timestamptz')
    .execute();
  await sql`create index outbox_unsent_index on outbox (created_at) where sent_at is null`.execute(
    db,
  );
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('outbox').execute();
  await db.schema.dropTable('audit_events').execute();
  await sql`drop function if exists audit_events_append_only()`.execute(db);
}
