import { sql, type Kysely } from 'kysely';

// Field records: what the fitters set and found on a brake, against the approved revision in
// force. A record is a draft while the technician fills it in; signed, only a countersignature
// may still change it; countersigned, it is a record like an approved revision and PostgreSQL
// itself refuses every change, to the record and to its measurements, checks and signatures.
// TRUNCATE is refused as for the revisions and the audit trail.

const TABLES = [
  'field_records',
  'field_record_measurements',
  'field_record_checks',
  'field_record_signatures',
] as const;

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await sql`alter table users drop constraint users_role_check`.execute(db);
  await sql`alter table users add constraint users_role_check
    check (role in ('engineer', 'checker', 'viewer', 'admin', 'technician'))`.execute(db);

  await db.schema
    .createTable('field_records')
    // Generated on the device, so a retried create finds the record it already made.
    .addColumn('id', 'uuid', (c) => c.primaryKey())
    .addColumn('position_id', 'uuid', (c) => c.notNull().references('brake_positions.id'))
    .addColumn('revision_id', 'uuid', (c) => c.notNull().references('revisions.id'))
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('draft'))
    .addColumn('performed_at', 'timestamptz', (c) => c.notNull())
    .addColumn('meter_hours', 'double precision')
    .addColumn('findings', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('out_of_tolerance', 'boolean', (c) => c.notNull().defaultTo(false))
    .addColumn('verification_code', 'text', (c) => c.unique())
    .addColumn('created_by', 'uuid', (c) => c.notNull().references('users.id'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint(
      'field_records_kind_check',
      sql`kind in ('commissioning', 'periodic-inspection', 're-adjustment', 'lining-replacement', 'after-repair')`,
    )
    .addCheckConstraint(
      'field_records_status_check',
      sql`status in ('draft', 'signed', 'countersigned')`,
    )
    .addCheckConstraint('field_records_meter_check', sql`meter_hours is null or meter_hours >= 0`)
    .execute();
  await sql`create index field_records_position_index on field_records (position_id, performed_at)`.execute(
    db,
  );

  await db.schema
    .createTable('field_record_measurements')
    .addColumn('record_id', 'uuid', (c) => c.notNull().references('field_records.id'))
    .addColumn('setting_key', 'text', (c) => c.notNull())
    .addColumn('ordinal', 'integer', (c) => c.notNull())
    .addColumn('as_found', 'double precision')
    .addColumn('as_left', 'double precision')
    .addColumn('reason', 'text', (c) => c.notNull().defaultTo(''))
    .addPrimaryKeyConstraint('field_record_measurements_pk', ['record_id', 'setting_key'])
    .execute();

  await db.schema
    .createTable('field_record_checks')
    .addColumn('record_id', 'uuid', (c) => c.notNull().references('field_records.id'))
    .addColumn('key', 'text', (c) => c.notNull())
    .addColumn('result', 'text', (c) => c.notNull())
    .addColumn('value', 'double precision')
    .addColumn('cycles', 'integer')
    .addColumn('note', 'text', (c) => c.notNull().defaultTo(''))
    .addPrimaryKeyConstraint('field_record_checks_pk', ['record_id', 'key'])
    .addCheckConstraint(
      'field_record_checks_result_check',
      sql`result in ('ok', 'not-ok', 'not-applicable')`,
    )
    .execute();

  await db.schema
    .createTable('field_record_signatures')
    .addColumn('record_id', 'uuid', (c) => c.notNull().references('field_records.id'))
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('user_id', 'uuid', (c) => c.notNull().references('users.id'))
    // The name as it stood when signing: a later rename does not rewrite a signed record.
    .addColumn('display_name', 'text', (c) => c.notNull())
    .addColumn('initials', 'text', (c) => c.notNull())
    .addColumn('signed_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('note', 'text', (c) => c.notNull().defaultTo(''))
    .addPrimaryKeyConstraint('field_record_signatures_pk', ['record_id', 'kind'])
    .addCheckConstraint(
      'field_record_signatures_kind_check',
      sql`kind in ('technician', 'countersign')`,
    )
    .execute();

  // Photos of a field record go through the attachment path; the record owns them.
  await sql`alter table attachments add column field_record_id uuid references field_records (id)`.execute(
    db,
  );

  await sql`create trigger field_records_set_updated_at before update on field_records
    for each row execute function set_updated_at()`.execute(db);

  await sql`
    create or replace function field_records_guard() returns trigger language plpgsql as $$
    begin
      if tg_op = 'DELETE' then
        if old.status <> 'draft' then
          raise exception 'field record % is % and immutable', old.id, old.status using errcode = 'HF001';
        end if;
        return old;
      end if;
      if old.status = 'countersigned' then
        raise exception 'field record % is countersigned and immutable', old.id using errcode = 'HF001';
      end if;
      if old.status = 'signed' and (
        new.status <> 'countersigned'
        or (new.position_id, new.revision_id, new.kind, new.performed_at, new.meter_hours,
            new.findings, new.out_of_tolerance, new.verification_code, new.created_by)
           is distinct from
           (old.position_id, old.revision_id, old.kind, old.performed_at, old.meter_hours,
            old.findings, old.out_of_tolerance, old.verification_code, old.created_by)
      ) then
        raise exception 'field record % is signed: only a countersignature may follow', old.id
          using errcode = 'HF001';
      end if;
      if old.status = 'draft' and new.status = 'countersigned' then
        raise exception 'field record % must be signed before it is countersigned', old.id
          using errcode = 'HF001';
      end if;
      return new;
    end $$`.execute(db);
  await sql`create trigger field_records_guard before update or delete on field_records
    for each row execute function field_records_guard()`.execute(db);

  // Measurements and checks change only while their record is a draft.
  await sql`
    create or replace function field_record_parts_guard() returns trigger language plpgsql as $$
    declare
      rec_id uuid := case when tg_op = 'DELETE' then old.record_id else new.record_id end;
      st text;
    begin
      select status into st from field_records where id = rec_id;
      if st is distinct from 'draft' then
        raise exception 'field record % is % and its % cannot change', rec_id, st, tg_table_name
          using errcode = 'HF001';
      end if;
      if tg_op = 'UPDATE' and old.record_id <> new.record_id then
        raise exception 'a measurement stays with its record' using errcode = 'HF001';
      end if;
      return case when tg_op = 'DELETE' then old else new end;
    end $$`.execute(db);
  for (const t of ['field_record_measurements', 'field_record_checks']) {
    await sql`create trigger ${sql.id(`${t}_guard`)} before insert or update or delete on ${sql.id(t)}
      for each row execute function field_record_parts_guard()`.execute(db);
  }

  // Signatures are appended, never changed or taken back.
  await sql`
    create or replace function field_record_signatures_append_only() returns trigger language plpgsql as $$
    begin
      raise exception 'field record signatures are append-only' using errcode = 'HF001';
    end $$`.execute(db);
  await sql`create trigger field_record_signatures_append_only before update or delete
    on field_record_signatures for each row execute function field_record_signatures_append_only()`.execute(
    db,
  );

  // A countersigned record's photos stay: none added, none removed, none altered.
  await sql`
    create or replace function attachments_field_record_guard() returns trigger language plpgsql as $$
    declare
      rec_id uuid := case when tg_op = 'DELETE' then old.field_record_id else new.field_record_id end;
    begin
      if tg_op = 'UPDATE' and old.field_record_id is distinct from new.field_record_id then
        raise exception 'an attachment stays with its owner' using errcode = 'HF001';
      end if;
      if rec_id is not null and exists (
        select from field_records where id = rec_id and status = 'countersigned'
      ) then
        raise exception 'field record % is countersigned and its photos cannot change', rec_id
          using errcode = 'HF001';
      end if;
      return case when tg_op = 'DELETE' then old else new end;
    end $$`.execute(db);
  await sql`create trigger attachments_field_record_guard before insert or update or delete
    on attachments for each row execute function attachments_field_record_guard()`.execute(db);

  for (const t of TABLES) {
    await sql`create trigger ${sql.id(`${t}_no_truncate`)} before truncate on ${sql.id(t)}
      for each statement execute function refuse_truncate()`.execute(db);
  }

  // Inspection schedule: one interval per position; reminders remembered so each goes once.
  await db.schema
    .createTable('inspection_intervals')
    .addColumn('position_id', 'uuid', (c) => c.primaryKey().references('brake_positions.id'))
    .addColumn('basis', 'text', (c) => c.notNull())
    .addColumn('every', 'integer', (c) => c.notNull())
    .addColumn('remind_days_ahead', 'integer', (c) => c.notNull().defaultTo(7))
    .addColumn('updated_by', 'uuid', (c) => c.notNull().references('users.id'))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('inspection_intervals_basis_check', sql`basis in ('days', 'hours')`)
    .addCheckConstraint('inspection_intervals_every_check', sql`every > 0`)
    .execute();
  await db.schema
    .createTable('inspection_reminders')
    .addColumn('position_id', 'uuid', (c) => c.notNull().references('brake_positions.id'))
    // The due date (yyyy-mm-dd) the reminder was for: a new due date earns a new reminder.
    .addColumn('due_on', 'date', (c) => c.notNull())
    .addColumn('sent_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint('inspection_reminders_pk', ['position_id', 'due_on'])
    .execute();
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('inspection_reminders').execute();
  await db.schema.dropTable('inspection_intervals').execute();
  await sql`drop trigger if exists attachments_field_record_guard on attachments`.execute(db);
  await sql`drop function if exists attachments_field_record_guard()`.execute(db);
  await sql`alter table attachments drop column field_record_id`.execute(db);
  for (const t of [...TABLES].reverse()) await db.schema.dropTable(t).execute();
  await sql`drop function if exists field_record_signatures_append_only()`.execute(db);
  await sql`drop function if exists field_record_parts_guard()`.execute(db);
  await sql`drop function if exists field_records_guard()`.execute(db);
  await sql`alter table users drop constraint users_role_check`.execute(db);
  // The schema below this one has no technician role: technicians keep their accounts and read
  // only (the least a role may do), rather than the step back failing on them.
  await sql`update users set role = 'viewer' where role = 'technician'`.execute(db);
  await sql`alter table users add constraint users_role_check
    check (role in ('engineer', 'checker', 'viewer', 'admin'))`.execute(db);
}
