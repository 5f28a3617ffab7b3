import { sql, type Kysely } from 'kysely';

// How a user types decimals: 'point' (2.5) or 'comma' (2,5). The editor reads numbers this way.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('users')
    .addColumn('number_format', 'text', (c) => c.notNull().defaultTo('point'))
    .execute();
  await db.schema
    .alterTable('users')
    .addCheckConstraint('users_number_format_check', sql`number_format in ('point', 'comma')`)
    .execute();
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('users').dropColumn('number_format').execute();
}
