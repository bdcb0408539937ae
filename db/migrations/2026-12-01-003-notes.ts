import { type Kysely, sql } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('notes')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('rig_id', 'uuid', (c) => c.notNull().references('rigs.id').onDelete('cascade'))
    .addColumn('parent_id', 'uuid', (c) => c.references('notes.id').onDelete('cascade'))
    .addColumn('target_kind', 'text', (c) => c.notNull().defaultTo('rig').check(sql`target_kind in ('rig', 'load', 'cable-run', 'reading')`))
    .addColumn('target_id', 'uuid')
    .addColumn('author_id', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('body', 'text', (c) => c.notNull())
    .addColumn('rig_version', 'integer', (c) => c.notNull())
    .addColumn('target_snapshot', 'jsonb')
    .addColumn('resolved_at', 'timestamptz')
    .addColumn('edited_at', 'timestamptz')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('notes_rig_idx').on('notes').columns(['rig_id', 'created_at']).execute();
  await db.schema
    .createTable('note_reads')
    .addColumn('user_id', 'text', (c) => c.notNull().references('user.id').onDelete('cascade'))
    .addColumn('rig_id', 'uuid', (c) => c.notNull().references('rigs.id').onDelete('cascade'))
    .addColumn('read_at', 'timestamptz', (c) => c.notNull())
    .addPrimaryKeyConstraint('note_reads_pk', ['user_id', 'rig_id'])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('note_reads').execute();
  await db.schema.dropTable('notes').execute();
}
