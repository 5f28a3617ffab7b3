import { sql, type Kysely } from 'kysely';

// Least privilege. The server signs in as `holdfast_app` (created with the database, see
// scripts/lib/db-roles.mjs and docs/operations.md), which may only read and write rows: every
// table in `public` gets SELECT, INSERT, UPDATE, DELETE and nothing more (no TRUNCATE, no
// REFERENCES, no TRIGGER), and tables made by later migrations get the same through ALTER DEFAULT
// PRIVILEGES. These apply to the role running the migrations (the owner), so migrations must keep
// running as it. Kysely's own bookkeeping tables stay out of the app's reach.
//
// Records must survive even their owner's mistakes: a BEFORE TRUNCATE trigger refuses to empty
// the revisions and the audit trail (row triggers never see a TRUNCATE).
//
// Without the role (a database built only by a superuser) the grants are skipped; the guards
// are installed regardless.
const APP = 'holdfast_app';

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create or replace function refuse_truncate() returns trigger language plpgsql as $$
    begin
      raise exception '% holds records and cannot be truncated', tg_table_name using errcode = 'HF001';
    end $$`.execute(db);
  for (const table of ['revisions', 'audit_events']) {
    await sql`create trigger ${sql.id(`${table}_no_truncate`)} before truncate on ${sql.id(table)}
      for each statement execute function refuse_truncate()`.execute(db);
  }
  await sql
    .raw(
      `
    do $$ begin
      if exists (select from pg_roles where rolname = '${APP}') then
        grant usage on schema public to ${APP};
        grant select, insert, update, delete on all tables in schema public to ${APP};
        grant usage, select on all sequences in schema public to ${APP};
        revoke all on kysely_migration, kysely_migration_lock from ${APP};
        alter default privileges in schema public
          grant select, insert, update, delete on tables to ${APP};
        alter default privileges in schema public grant usage, select on sequences to ${APP};
      end if;
    end $$`,
    )
    .execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await sql
    .raw(
      `
    do $$ begin
      if exists (select from pg_roles where rolname = '${APP}') then
        alter default privileges in schema public revoke all on tables from ${APP};
        alter default privileges in schema public revoke all on sequences from ${APP};
        revoke all on all tables in schema public from ${APP};
        revoke all on all sequences in schema public from ${APP};
        revoke usage on schema public from ${APP};
      end if;
    end $$`,
    )
    .execute(db);
  await sql`drop trigger if exists revisions_no_truncate on revisions`.execute(db);
  await sql`drop trigger if exists audit_events_no_truncate on audit_events`.execute(db);
  await sql`drop function if exists refuse_truncate()`.execute(db);
}
