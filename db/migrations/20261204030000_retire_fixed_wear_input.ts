import { sql, type Kysely } from 'kysely';

// Core 1.1.0 derives the shoe sheets' worn case from the stroke chain (the re-adjustment point),
// so the fixed `wear` input is no longer a field. Open drafts and returned revisions of those
// sheets drop it, or saving them would be refused for a field the engineer cannot see. Approved,
// superseded and in-check revisions keep their inputs as frozen.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    update revisions r set inputs = r.inputs - 'wear'
    from sheets s
    where s.id = r.sheet_id
      and s.sheet_type in ('hoist-shoe-brake', 'travel-shoe-brake')
      and r.state in ('draft', 'returned')
      and r.inputs ? 'wear'`.execute(db);
}

// The value dropped is not known any more; nothing to restore.
export async function down(): Promise<void> {}
