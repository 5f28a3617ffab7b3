import type { Kysely } from 'kysely';

// Frozen in time: no application imports. A brake position described in the plant's own words:
// what kind of brake sits there, what releases it, and what lining it carries (free text, as the
// plant writes it on its drawings; empty until someone records it).
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('brake_positions')
    .addColumn('brake_kind', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('thruster', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('lining', 'text', (c) => c.notNull().defaultTo(''))
    .execute();
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('brake_positions')
    .dropColumn('lining')
    .dropColumn('thruster')
    .dropColumn('brake_kind')
    .execute();
}
