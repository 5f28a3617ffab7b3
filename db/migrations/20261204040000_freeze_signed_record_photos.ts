import { sql, type Kysely } from 'kysely';

// A signed field record's measurements and checks are frozen; its photos were frozen only once
// countersigned. They are part of what the technician signed, so they freeze with the rest:
// photos change only while their record is a draft.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await guard(db, 'draft');
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await guard(db, 'countersigned');
}

/** `mutableWhile`: 'draft' refuses any status but draft; 'countersigned' refuses that one only. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
async function guard(db: Kysely<any>, mutableWhile: 'draft' | 'countersigned'): Promise<void> {
  const frozen =
    mutableWhile === 'draft' ? sql.raw(`status <> 'draft'`) : sql.raw(`status = 'countersigned'`);
  await sql`
    create or replace function attachments_field_record_guard() returns trigger language plpgsql as $$
    declare
      rec_id uuid := case when tg_op = 'DELETE' then old.field_record_id else new.field_record_id end;
      st text;
    begin
      if tg_op = 'UPDATE' and old.field_record_id is distinct from new.field_record_id then
        raise exception 'an attachment stays with its owner' using errcode = 'HF001';
      end if;
      if rec_id is not null then
        select status into st from field_records where id = rec_id and ${frozen};
        if found then
          raise exception 'field record % is % and its photos cannot change', rec_id, st
            using errcode = 'HF001';
        end if;
      end if;
      return case when tg_op = 'DELETE' then old else new end;
    end $$`.execute(db);
}
