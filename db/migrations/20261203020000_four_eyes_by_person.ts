import { sql, type Kysely } from 'kysely';

// Four-eyes by person, not by author field. A revision remembers everyone who saved a change to
// it (editor_ids) and everyone who submitted it (submitter_ids); both lists only grow. A check
// constraint refuses an approved or superseded revision whose checker is its author, one of its
// editors or one of its submitters, so a raw UPDATE cannot approve one's own work either.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await sql`alter table revisions
    add column editor_ids uuid[] not null default '{}',
    add column submitter_ids uuid[] not null default '{}'`.execute(db);

  // Open revisions learn their editors and submitters from the audit trail; frozen ones are left
  // as they are (the immutability trigger guards them, and their author check already held).
  await sql`update revisions r set
      editor_ids = coalesce((select array_agg(distinct e.actor_id) from audit_events e
        where e.entity = 'revision' and e.entity_id = r.id::text and e.action = 'revision.saved'
          and e.actor_id is not null), '{}'),
      submitter_ids = coalesce((select array_agg(distinct e.actor_id) from audit_events e
        where e.entity = 'revision' and e.entity_id = r.id::text and e.action = 'revision.submitted'
          and e.actor_id is not null), '{}')
    where r.state in ('draft', 'in_check', 'returned')`.execute(db);

  await sql`alter table revisions add constraint revisions_four_eyes_check check (
    state not in ('approved', 'superseded')
    or not (checker_id = any (editor_ids || submitter_ids || author_id)))`.execute(db);

  await sql`
    create or replace function revisions_participants_grow() returns trigger language plpgsql as $$
    begin
      if not (new.editor_ids @> old.editor_ids and new.submitter_ids @> old.submitter_ids) then
        raise exception 'revision % keeps everyone who edited or submitted it', old.id
          using errcode = 'HF001';
      end if;
      if old.state = 'in_check' and (new.editor_ids, new.submitter_ids)
          is distinct from (old.editor_ids, old.submitter_ids) then
        raise exception 'revision % is in check; its editors cannot change', old.id
          using errcode = 'HF001';
      end if;
      return new;
    end $$`.execute(db);
  await sql`create trigger revisions_participants_grow before update on revisions
    for each row execute function revisions_participants_grow()`.execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop trigger if exists revisions_participants_grow on revisions`.execute(db);
  await sql`drop function if exists revisions_participants_grow()`.execute(db);
  await sql`alter table revisions drop constraint if exists revisions_four_eyes_check`.execute(db);
  await sql`alter table revisions drop column editor_ids, drop column submitter_ids`.execute(db);
}
