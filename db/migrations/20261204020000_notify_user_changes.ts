import { sql, type Kysely } from 'kysely';

// Every change to a user row (sign-out, password, role, deactivation) is announced on the
// `holdfast_user_changed` channel with the user's id, when the change commits. Server processes
// keep the signed-in users they have looked up in memory and drop an entry on this notice, so a
// sign-out ends the access token on every process without a look-up on every request.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create function announce_user_change() returns trigger language plpgsql as $$
    begin
      perform pg_notify('holdfast_user_changed', case when tg_op = 'TRUNCATE' then '*' else old.id::text end);
      return null;
    end $$`.execute(db);
  await sql`
    create trigger users_announce_change after update or delete on users
    for each row execute function announce_user_change()`.execute(db);
  await sql`
    create trigger users_announce_truncate after truncate on users
    for each statement execute function announce_user_change()`.execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop trigger users_announce_truncate on users`.execute(db);
  await sql`drop trigger users_announce_change on users`.execute(db);
  await sql`drop function announce_user_change()`.execute(db);
}
