import { sql, type Kysely } from 'kysely';

// Sign-out and password changes end access tokens at once: every token carries the user's
// session version and the guard refuses older ones. Password resets are one-time links whose
// token is stored only as a SHA-256.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('users')
    .addColumn('session_version', 'integer', (c) => c.notNull().defaultTo(0))
    .execute();
  await db.schema
    .createTable('password_resets')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('user_id', 'uuid', (c) => c.notNull().references('users.id').onDelete('cascade'))
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('requested_by', 'uuid', (c) => c.references('users.id').onDelete('set null'))
    .addColumn('expires_at', 'timestamptz', (c) => c.notNull())
    .addColumn('used_at', 'timestamptz')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema
    .createIndex('password_resets_user_id_index')
    .on('password_resets')
    .column('user_id')
    .execute();
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('password_resets').execute();
  await db.schema.alterTable('users').dropColumn('session_version').execute();
}
