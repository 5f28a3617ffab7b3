import { sql, type Kysely } from 'kysely';

// Frozen in time: no application imports. The calculation core adds the sheet type of a shoe
// brake on a conveyor or mill-auxiliary drive (duty stated at the brake shaft); the sheets table
// names every sheet type it admits.
const BEFORE = ['hoist-shoe-brake', 'travel-shoe-brake', 'caliper-disc-brake', 'disc-spring-stack'];
const AFTER = [...BEFORE.slice(0, 2), 'drive-shoe-brake', ...BEFORE.slice(2)];

// eslint-disable-next-line @typescript-eslint/no-explicit-any
async function admit(db: Kysely<any>, types: string[]): Promise<void> {
  await sql`alter table sheets drop constraint sheets_sheet_type_check`.execute(db);
  await sql`alter table sheets add constraint sheets_sheet_type_check check (sheet_type in (${sql.join(
    types.map((t) => sql.lit(t)),
  )}))`.execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await admit(db, AFTER);
}

// A sheet of the new type must go before the constraint can narrow again: down refuses otherwise.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await admit(db, BEFORE);
}
