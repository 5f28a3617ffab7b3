import { sql, type Kysely } from 'kysely';

// Fields of a draft that still hold a value nobody entered or confirmed for this brake (the
// example duty, a copied sheet, a default choice). Submitting is refused while any is left.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('revisions')
    .addColumn('unconfirmed', 'jsonb', (c) => c.notNull().defaultTo(sql`'[]'::jsonb`))
    .execute();
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('revisions').dropColumn('unconfirmed').execute();
}
