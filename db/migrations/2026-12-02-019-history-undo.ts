import type { Kysely } from 'kysely';

/** A history entry that applied a Fix keeps the power system before and after, so History can undo it once. */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('rig_history').addColumn('undo', 'jsonb').addColumn('undone_at', 'timestamptz').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('rig_history').dropColumn('undo').dropColumn('undone_at').execute();
}
