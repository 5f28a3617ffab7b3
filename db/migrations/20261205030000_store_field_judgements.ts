import { sql, type Kysely } from 'kysely';

// Frozen in time: no application imports. A field record's verdicts were computed when it was
// read, with the tolerance of the frozen evaluation or, when it had none, the one calc declares
// today: a calc release that changed a declared tolerance would have changed the verdicts of
// records already signed. Each measurement now keeps what it was judged against (target in SI,
// unit, dimension, tolerance) and its two verdicts, written at every save of a draft and for the
// last time at signing; from then on field_record_parts_guard (20261204010000) refuses any change
// to the row, these columns included.
//
// Rows of records signed before this migration keep null here: SQL alone cannot judge them and a
// migration imports no calc. Reads judge such rows with the current calc, as before (the server's
// field-record-mapper.ts; docs/field-records.md).
const COLUMNS = [
  ['target', 'double precision'],
  ['unit', 'text'],
  ['dimension', 'text'],
  ['tolerance', 'jsonb'],
  ['as_found_verdict', 'jsonb'],
  ['as_left_verdict', 'jsonb'],
] as const;

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  for (const [name, type] of COLUMNS) {
    await sql`alter table field_record_measurements add column ${sql.id(name)} ${sql.raw(type)}`.execute(
      db,
    );
  }
  // A stored judgement is whole: target, unit and dimension together (verdicts may be null:
  // no value entered, or no tolerance declared).
  await sql`alter table field_record_measurements add constraint field_record_measurements_judged_check
    check ((target is null) = (unit is null) and (unit is null) = (dimension is null)
      and (dimension is not null or (tolerance is null and as_found_verdict is null
        and as_left_verdict is null)))`.execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await sql`alter table field_record_measurements drop constraint field_record_measurements_judged_check`.execute(
    db,
  );
  for (const [name] of [...COLUMNS].reverse()) {
    await sql`alter table field_record_measurements drop column ${sql.id(name)}`.execute(db);
  }
}
