import { type Kysely, sql } from 'kysely';

/** Readings (typed in, or rows of an uploaded log), the uploads (logs and install photos) and their objects. */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('uploads')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('rig_id', 'uuid', (c) => c.notNull().references('rigs.id').onDelete('cascade'))
    .addColumn('kind', 'text', (c) => c.notNull().check(sql`kind in ('log', 'photo')`))
    .addColumn('file_name', 'text', (c) => c.notNull())
    .addColumn('content_type', 'text', (c) => c.notNull())
    .addColumn('size_bytes', 'integer', (c) => c.notNull())
    .addColumn('object_key', 'text', (c) => c.notNull().unique())
    .addColumn('thumb_key', 'text')
    .addColumn('caption', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('row_count', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('error_count', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('errors', 'jsonb')
    .addColumn('mapping', 'jsonb')
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('uploads_rig_idx').on('uploads').columns(['rig_id', 'created_at']).execute();
  await db.schema
    .createTable('readings')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('rig_id', 'uuid', (c) => c.notNull().references('rigs.id').onDelete('cascade'))
    .addColumn('upload_id', 'uuid', (c) => c.references('uploads.id').onDelete('cascade'))
    .addColumn('at', 'timestamptz', (c) => c.notNull())
    .addColumn('voltage_v', 'double precision', (c) => c.notNull())
    .addColumn('current_a', 'double precision')
    .addColumn('soc_percent', 'double precision')
    .addColumn('rested', 'boolean', (c) => c.notNull().defaultTo(false))
    .addColumn('place', 'text', (c) => c.notNull().defaultTo('terminals').check(sql`place in ('terminals', 'device', 'ground')`))
    .addColumn('note', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('readings_rig_at_idx').on('readings').columns(['rig_id', 'at']).execute();
  await db.schema.createIndex('readings_upload_idx').on('readings').columns(['upload_id']).execute();
  // The rig remembers the columns of its last log, so the next upload is mapped already.
  await db.schema.alterTable('rigs').addColumn('log_mapping', 'jsonb').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('rigs').dropColumn('log_mapping').execute();
  await db.schema.dropTable('readings').execute();
  await db.schema.dropTable('uploads').execute();
}
