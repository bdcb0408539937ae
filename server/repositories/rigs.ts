import type { Kysely, Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database, LoadRow, NewLoad, RigRow } from '@/db/schema';

type Exec = Db | Transaction<Database> | Kysely<Database>;

/** The rig and the caller's role in its household; null when either the rig or the membership is missing. */
export async function findRigWithRole(db: Exec, rigId: string, userId: string) {
  const row = await db
    .selectFrom('rigs')
    .innerJoin('member', (j) => j.onRef('member.organizationId', '=', 'rigs.household_id').on('member.userId', '=', userId))
    .innerJoin('organization', 'organization.id', 'rigs.household_id')
    .selectAll('rigs')
    .select(['member.role as role', 'member.userId as viewer_id', 'organization.name as household_name'])
    .where('rigs.id', '=', rigId)
    .executeTakeFirst();
  return row ?? null;
}

export async function listRigsForUser(db: Exec, userId: string) {
  return db
    .selectFrom('rigs')
    .innerJoin('member', (j) => j.onRef('member.organizationId', '=', 'rigs.household_id').on('member.userId', '=', userId))
    .innerJoin('organization', 'organization.id', 'rigs.household_id')
    .selectAll('rigs')
    .select(['member.role as role', 'member.userId as viewer_id', 'organization.name as household_name'])
    .orderBy('rigs.updated_at', 'desc')
    .execute();
}

export async function loadsOfRigs(db: Exec, rigIds: string[]): Promise<(LoadRow & { added_by_name: string | null })[]> {
  if (!rigIds.length) return [];
  return db
    .selectFrom('loads')
    .leftJoin('user', 'user.id', 'loads.added_by')
    .selectAll('loads')
    .select('user.name as added_by_name')
    .where('loads.rig_id', 'in', rigIds)
    .orderBy('loads.position')
    .orderBy('loads.created_at')
    .execute();
}

export async function insertRig(
  db: Exec,
  rig: { householdId: string; createdBy: string; name: string; vehicle: string; power: unknown },
  loads: Omit<NewLoad, 'rig_id'>[],
  /** Runs in the same transaction once the rig is there (its History entry). */
  then?: (trx: Transaction<Database>, row: RigRow) => Promise<void>,
): Promise<RigRow> {
  return db.transaction().execute(async (trx) => {
    const row = await trx
      .insertInto('rigs')
      .values({ household_id: rig.householdId, created_by: rig.createdBy, name: rig.name, vehicle: rig.vehicle, power: JSON.stringify(rig.power) })
      .returningAll()
      .executeTakeFirstOrThrow();
    if (loads.length) await trx.insertInto('loads').values(loads.map((l) => ({ ...l, rig_id: row.id }))).execute();
    await then?.(trx, row);
    return row;
  });
}

export async function householdRole(db: Exec, householdId: string, userId: string): Promise<string | null> {
  const row = await db.selectFrom('member').select('role').where('organizationId', '=', householdId).where('userId', '=', userId).executeTakeFirst();
  return row?.role ?? null;
}

export async function householdsOfUser(db: Exec, userId: string) {
  return db
    .selectFrom('member')
    .innerJoin('organization', 'organization.id', 'member.organizationId')
    .select(['organization.id as id', 'organization.name as name', 'member.role as role'])
    .where('member.userId', '=', userId)
    .orderBy('organization.createdAt')
    .execute();
}

export async function householdPeople(db: Exec, householdId: string) {
  const members = await db
    .selectFrom('member')
    .innerJoin('user', 'user.id', 'member.userId')
    .select(['member.id as id', 'member.userId as userId', 'member.role as role', 'member.createdAt as joinedAt', 'user.name as name', 'user.email as email'])
    .where('member.organizationId', '=', householdId)
    .orderBy('member.createdAt')
    .execute();
  const invitations = await db
    .selectFrom('invitation')
    .select(['id', 'email', 'role', 'status', 'expiresAt', 'createdAt'])
    .where('organizationId', '=', householdId)
    .where('status', '=', 'pending')
    .orderBy('createdAt')
    .execute();
  return { members, invitations };
}

export async function findMember(db: Exec, householdId: string, memberId: string) {
  return (await db.selectFrom('member').selectAll().where('organizationId', '=', householdId).where('id', '=', memberId).executeTakeFirst()) ?? null;
}

export async function countOwners(db: Exec, householdId: string): Promise<number> {
  const rows = await db.selectFrom('member').select('role').where('organizationId', '=', householdId).execute();
  return rows.filter((r) => r.role.split(',').includes('owner')).length;
}

export async function findInvitation(db: Exec, invitationId: string) {
  return (
    (await db
      .selectFrom('invitation')
      .innerJoin('organization', 'organization.id', 'invitation.organizationId')
      .leftJoin('user', 'user.id', 'invitation.inviterId')
      .select([
        'invitation.id as id',
        'invitation.email as email',
        'invitation.role as role',
        'invitation.status as status',
        'invitation.expiresAt as expiresAt',
        'invitation.organizationId as householdId',
        'organization.name as householdName',
        'user.name as inviterName',
      ])
      .where('invitation.id', '=', invitationId)
      .executeTakeFirst()) ?? null
  );
}

/** Applies a change only if the rig is still at the version the editor saw; returns null when it is not. */
export async function updateRigIfVersion(db: Exec, rigId: string, version: number, patch: { name?: string; vehicle?: string; power?: unknown }) {
  return (
    (await db
      .updateTable('rigs')
      .set({
        ...(patch.name !== undefined ? { name: patch.name } : {}),
        ...(patch.vehicle !== undefined ? { vehicle: patch.vehicle } : {}),
        ...(patch.power !== undefined ? { power: JSON.stringify(patch.power) } : {}),
        version: version + 1,
        updated_at: new Date(),
      })
      .where('id', '=', rigId)
      .where('version', '=', version)
      .returning(['id', 'version'])
      .executeTakeFirst()) ?? null
  );
}

/** Every load change moves the rig on a version, so the Rigs screen shows the last change. */
export async function touchRig(db: Exec, rigId: string) {
  await db
    .updateTable('rigs')
    .set((eb) => ({ version: eb('version', '+', 1), updated_at: new Date() }))
    .where('id', '=', rigId)
    .execute();
}

/** Deletes the rig (its rows go with it) and returns the keys of its stored objects: logs, photos and thumbnails. */
export async function deleteRig(db: Exec, rigId: string): Promise<string[]> {
  return db.transaction().execute(async (trx) => {
    const uploads = await trx.selectFrom('uploads').select(['object_key', 'thumb_key']).where('rig_id', '=', rigId).forUpdate().execute();
    await trx.deleteFrom('rigs').where('id', '=', rigId).execute();
    return uploads.flatMap((u) => [u.object_key, u.thumb_key].filter((k): k is string => !!k));
  });
}

export async function insertLoad(db: Exec, rigId: string, load: Omit<NewLoad, 'rig_id' | 'position'>) {
  const max = await db.selectFrom('loads').select((eb) => eb.fn.max('position').as('p')).where('rig_id', '=', rigId).executeTakeFirst();
  const row = await db
    .insertInto('loads')
    .values({ ...load, rig_id: rigId, position: (Number(max?.p ?? -1) || 0) + 1 })
    .returningAll()
    .executeTakeFirstOrThrow();
  await touchRig(db, rigId);
  return row;
}

export async function updateLoad(db: Exec, rigId: string, loadId: string, load: Omit<NewLoad, 'rig_id' | 'position' | 'added_by'>) {
  const row = await db.updateTable('loads').set({ ...load, updated_at: new Date() }).where('id', '=', loadId).where('rig_id', '=', rigId).returningAll().executeTakeFirst();
  if (row) await touchRig(db, rigId);
  return row ?? null;
}

export async function deleteLoad(db: Exec, rigId: string, loadId: string) {
  const row = await db.deleteFrom('loads').where('id', '=', loadId).where('rig_id', '=', rigId).returning(['id', 'name']).executeTakeFirst();
  if (row) await touchRig(db, rigId);
  return row ?? null;
}

export async function rigsOfHousehold(db: Exec, householdId: string) {
  return db.selectFrom('rigs').selectAll().where('household_id', '=', householdId).execute();
}

/** What the model needs of a rig besides its loads. */
export const findRigForModel = (db: Exec, rigId: string) => db.selectFrom('rigs').select(['id', 'name', 'version', 'power']).where('id', '=', rigId).executeTakeFirst();

export const allRigIds = (db: Exec) => db.selectFrom('rigs').select('id').execute();

/** The rig's id and name when the person is in its household. */
export const rigOfMember = (db: Exec, rigId: string, userId: string) =>
  db.selectFrom('rigs').innerJoin('member', 'member.organizationId', 'rigs.household_id').select(['rigs.id', 'rigs.name']).where('rigs.id', '=', rigId).where('member.userId', '=', userId).executeTakeFirst();

/** The household's people and their roles. */
export const membersOf = (db: Exec, householdId: string) => db.selectFrom('member').select(['userId', 'role']).where('organizationId', '=', householdId).execute();
