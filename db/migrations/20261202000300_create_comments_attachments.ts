import { sql, type Kysely } from 'kysely';

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('comments')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('revision_id', 'uuid', (c) => c.notNull().references('revisions.id'))
    .addColumn('parent_id', 'uuid', (c) => c.references('comments.id'))
    .addColumn('author_id', 'uuid', (c) => c.notNull().references('users.id'))
    .addColumn('body', 'text', (c) => c.notNull())
    .addColumn('anchor_kind', 'text')
    .addColumn('anchor_key', 'text')
    .addColumn('resolved', 'boolean', (c) => c.notNull().defaultTo(false))
    .addColumn('resolved_by', 'uuid', (c) => c.references('users.id'))
    .addColumn('resolved_at', 'timestamptz')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint(
      'comments_anchor_check',
      sql`(anchor_kind is null and anchor_key is null)
        or (anchor_kind in ('input', 'step', 'check') and anchor_key is not null)`,
    )
    .execute();
  await sql`create index comments_revision_id_index on comments (revision_id, created_at)`.execute(
    db,
  );

  await db.schema
    .createTable('attachments')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('revision_id', 'uuid', (c) => c.notNull().references('revisions.id'))
    .addColumn('file_name', 'text', (c) => c.notNull())
    .addColumn('content_type', 'text', (c) => c.notNull())
    .addColumn('size', 'bigint', (c) => c.notNull())
    .addColumn('sha256', 'text', (c) => c.notNull())
    .addColumn('storage_key', 'text', (c) => c.notNull().unique())
    .addColumn('uploaded_by', 'uuid', (c) => c.notNull().references('users.id'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint(
      'attachments_content_type_check',
      sql`content_type in ('application/pdf', 'image/png', 'image/jpeg', 'text/plain', 'text/csv')`,
    )
    .addCheckConstraint('attachments_sha256_check', sql`sha256 ~ '^[0-9a-f]{64}$'`)
    .addCheckConstraint('attachments_size_check', sql`size >= 0 and size <= 26214400`)
    .execute();
  await sql`create index attachments_revision_id_index on attachments (revision_id)`.execute(db);
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('attachments').execute();
  await db.schema.dropTable('comments').execute();
}
