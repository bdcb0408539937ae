import { isDeepStrictEqual } from 'node:util';
import { gzipSync } from 'node:zlib';

import type { Db } from '@/db/client';
import { compare } from '@/shared/energy/compare';
import { project } from '@/shared/energy/project';
import { can, type HouseholdRole } from '@/shared/permissions';
import { type Load, projectionInputSchema, type RigPower, rigPowerSchema } from '@/shared/schemas/projection';
import { loadFromRow, loadToRow, modelInput, type SavedLoad, stripLoad } from './rigs-model';
import { activeTripOutlook, activeTrips } from './trip-model';
import { type Actor, daysParkedOf, describeLoad, describeLoadEdit, describeNewRig, describePowerChange } from './history';
import { insertHistory } from '../repositories/history';
import type { RigCreateInput, RigHeader, RigPermissions, RigUpdateInput } from '@/shared/schemas/rig';
import type { Auth } from '../auth';
import type { Storage } from '../storage';
import { viaAuth } from '../auth-errors';
import { HttpError } from '../errors';
import { rigChanged, type WriteCtx } from './rig-changed';
import { deleteLoad, deleteRig, householdRole, insertLoad, insertRig, listRigsForUser, loadsOfRigs, updateLoad, updateRigIfVersion } from '../repositories/rigs';

/** What the role may do, for the client to hide controls (the server checks every request anyway). */
export function permissionsOf(role: string): RigPermissions {
  return {
    edit: can(role, { rig: ['update'] }),
    delete: can(role, { rig: ['delete'] }),
    manageLoads: can(role, { load: ['create'] }),
    manageTrips: can(role, { trip: ['create'] }),
    editAnyLoad: can(role, { load: ['update-any'] }),
    managePeople: can(role, { people: ['manage'] }),
    comment: can(role, { note: ['create'] }),
  };
}

type RigRowWithRole = Awaited<ReturnType<typeof listRigsForUser>>[number];

export function rigDto(row: RigRowWithRole, loads: SavedLoad[]): RigHeader & { power: RigPower; loads: SavedLoad[] } {
  const power = rigPowerSchema.parse(row.power);
  return {
    id: row.id,
    name: row.name,
    vehicle: row.vehicle,
    householdId: row.household_id,
    householdName: row.household_name,
    role: row.role as HouseholdRole,
    viewerId: row.viewer_id,
    permissions: permissionsOf(row.role),
    version: row.version,
    updatedAt: new Date(row.updated_at as unknown as Date).toISOString(),
    power,
    loads,
  };
}
export type RigDto = ReturnType<typeof rigDto>;

export async function listRigs(db: Db, userId: string) {
  const rows = await listRigsForUser(db, userId);
  const loads = await loadsOfRigs(
    db,
    rows.map((r) => r.id),
  );
  return rows.map((row) => {
    const dto = rigDto(row, loads.filter((l) => l.rig_id === row.id).map(loadFromRow));
    const p = project(modelInput(dto.power, dto.loads), { fixes: false });
    const { loads: rigLoads, power: _power, ...summary } = dto;
    return {
      ...summary,
      loadCount: rigLoads.length,
      daysParked: p.parked.daysToCutoff,
      daysOnRoutine: p.routine.daysToCutoff,
      holds: p.routine.holds,
      marginState: p.margin.state,
      horizonDays: p.horizonDays,
    };
  });
}

export async function createRig(db: Db, auth: Auth, actor: Actor, input: RigCreateInput) {
  const userId = actor.id;
  let householdId = input.householdId;
  if (householdId) {
    const role = await householdRole(db, householdId, userId);
    if (!role) throw new HttpError(404, 'not_found', 'No such household.', [{ path: 'householdId', message: 'No such household.' }]);
    if (!can(role, { rig: ['update'] })) throw new HttpError(403, 'forbidden', 'Only an owner can add a rig to this household.');
  } else {
    const slug = `${input.name.toLowerCase().replace(/[^a-z0-9]+/g, '-').slice(0, 30)}-${crypto.randomUUID().slice(0, 8)}`;
    const household = await viaAuth(() => auth.api.createOrganization({ body: { name: `${input.name} household`, slug, userId } }));
    householdId = household!.id;
  }
  // Checks the whole input the model will see (an AC load without an inverter, say) before saving.
  const parsed = projectionInputSchema.safeParse({ ...input.power, loads: input.loads });
  if (!parsed.success) {
    throw new HttpError(400, 'validation_failed', 'Some fields are not valid.', parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })));
  }
  const row = await insertRig(
    db,
    { householdId, createdBy: userId, name: input.name, vehicle: input.vehicle, power: input.power },
    input.loads.map((l, i) => loadToRow(l, i, userId)),
    (trx, rig) =>
      insertHistory(trx, {
        rigId: rig.id,
        actor,
        kind: 'rig-created',
        summary: `created the rig ${describeNewRig(input)}`,
        daysParkedBefore: null,
        daysParkedAfter: daysParkedOf(input.power, input.loads),
      }),
  );
  return row.id;
}

function validateModel(power: RigPower, loads: Load[], fieldPrefix = '') {
  const parsed = projectionInputSchema.safeParse({ ...power, loads });
  if (!parsed.success) {
    throw new HttpError(400, 'validation_failed', 'Some fields are not valid.', parsed.error.issues.map((i) => ({ path: fieldPrefix + i.path.join('.'), message: i.message })));
  }
  return parsed.data;
}

export async function readRig(db: Db, rig: RigRowWithRole) {
  const loads = (await loadsOfRigs(db, [rig.id])).map(loadFromRow);
  return rigDto(rig, loads);
}

/**
 * Outlooks by rig and version: every change to what the model reads (power, routine, loads) moves the
 * rig's version on, so a cached Outlook is never stale. Kept as sent: the JSON, its gzip form (made once,
 * about a tenth of the size) and an entity tag. A small map, oldest out first.
 */
export type OutlookBody = { json: string; gzip: Buffer; etag: string };
const outlookCache = new Map<string, OutlookBody>();
const OUTLOOK_CACHE_SIZE = 200;
// The tags name this server process too, so a new release (a restart) never answers 304 with figures an
// older model worked out.
const PROCESS_TAG = Date.now().toString(36);

/** The saved rig through the model: the Outlook, Fixes included, as the API sends it. */
export async function rigOutlook(db: Db, rig: RigRowWithRole): Promise<OutlookBody> {
  const key = `${rig.id}:${rig.version}`;
  const hit = outlookCache.get(key);
  if (hit) return hit;
  const dto = await readRig(db, rig);
  const input = modelInput(dto.power, dto.loads);
  // With an active trip the Outlook also follows its legs (the weekly routine stays for when none is).
  const trip = activeTripOutlook(input, (await activeTrips(db, [rig.id])).get(rig.id));
  const json = JSON.stringify({ rigId: dto.id, version: dto.version, ...project(input), trip });
  const body = { json, gzip: gzipSync(json), etag: `"outlook-${rig.id}-${rig.version}-${PROCESS_TAG}"` };
  outlookCache.set(key, body);
  if (outlookCache.size > OUTLOOK_CACHE_SIZE) outlookCache.delete(outlookCache.keys().next().value!);
  return body;
}

export async function tryLoads(db: Db, rig: RigRowWithRole, candidates: Load[]) {
  const dto = await readRig(db, rig);
  if (!candidates.length && !dto.loads.some((l) => l.status === 'candidate')) {
    throw new HttpError(400, 'validation_failed', 'Give at least one candidate load to try.', [{ path: 'candidates', message: 'Add a candidate load to try.' }]);
  }
  const model = validateModel(dto.power, dto.loads.map(stripLoad));
  validateModel(dto.power, [...dto.loads.map(stripLoad), ...candidates], 'with.');
  return compare({ rig: model, candidates });
}


/**
 * Saves a change to the rig's name, vehicle or power system. A save that changes nothing keeps the rig as
 * it is: no new version, no history entry, no margin check: `changed` says which.
 */
export async function changeRig(ctx: WriteCtx, rig: RigRowWithRole, actor: Actor, input: RigUpdateInput) {
  const { db } = ctx;
  const loads = (await loadsOfRigs(db, [rig.id])).map(loadFromRow).map(stripLoad);
  if (input.power) validateModel(input.power, loads, 'power.');
  const before = rigPowerSchema.parse(rig.power);
  const conflict = () =>
    new HttpError(409, 'conflict', 'Someone else changed this rig since you opened it. Reload to see their change, then make yours again.', [
      { path: 'version', message: `This rig is now at version ${rig.version}; your edit started from version ${input.version}.` },
    ]);
  const powerChanged = input.power !== undefined && !isDeepStrictEqual(input.power, before);
  const renamed = (input.name !== undefined && input.name !== rig.name) || (input.vehicle !== undefined && input.vehicle !== rig.vehicle);
  if (!powerChanged && !renamed) {
    if (input.version !== rig.version) throw conflict();
    return { id: rig.id, version: rig.version, changed: false };
  }
  const saved = await db.transaction().execute(async (trx) => {
    const updated = await updateRigIfVersion(trx, rig.id, input.version, { name: input.name, vehicle: input.vehicle, power: input.power });
    if (!updated) throw conflict();
    const change = powerChanged ? describePowerChange(before, input.power!) : null;
    if (change || renamed) {
      await insertHistory(trx, {
        rigId: rig.id,
        actor,
        kind: change?.kind ?? 'rig',
        summary: change?.summary ?? `renamed the rig ${input.name ?? rig.name}${input.vehicle ? ` (${input.vehicle})` : ''}`,
        daysParkedBefore: daysParkedOf(before, loads),
        daysParkedAfter: daysParkedOf(input.power ?? before, loads),
      });
    }
    return { ...updated, changed: true };
  });
  rigChanged(ctx, rig.id);
  return saved;
}

/** A member may change only the loads they added; an owner any load (shared/permissions.ts). */
function mayChangeLoad(rig: RigRowWithRole, actor: Actor, load: SavedLoad, verb: 'update' | 'delete') {
  if (load.addedBy?.id === actor.id && can(rig.role, { load: [`${verb}-own`] })) return;
  if (can(rig.role, { load: [`${verb}-any`] })) return;
  throw new HttpError(403, 'forbidden', `Only ${load.addedBy?.name || 'the person who added it'} or an owner can ${verb === 'update' ? 'edit' : 'delete'} ${load.name}.`);
}

export async function addLoad(ctx: WriteCtx, rig: RigRowWithRole, actor: Actor, load: Load) {
  const { db } = ctx;
  const dto = await readRig(db, rig);
  const current = dto.loads.map(stripLoad);
  validateModel(dto.power, [...current, load].map((l) => ({ ...l, status: 'installed' as const })));
  const { position: _p, ...row } = loadToRow(load, 0, actor.id);
  const added = await db.transaction().execute(async (trx) => {
    const saved = loadFromRow(await insertLoad(trx, rig.id, row));
    await insertHistory(trx, {
      rigId: rig.id,
      actor,
      kind: 'load-added',
      summary: `added ${describeLoad(load)}`,
      daysParkedBefore: daysParkedOf(dto.power, current),
      daysParkedAfter: daysParkedOf(dto.power, [...current, load]),
    });
    return saved;
  });
  rigChanged(ctx, rig.id);
  return added;
}

export async function editLoad(ctx: WriteCtx, rig: RigRowWithRole, actor: Actor, loadId: string, load: Load) {
  const { db } = ctx;
  const dto = await readRig(db, rig);
  const old = dto.loads.find((l) => l.id === loadId);
  if (!old) throw new HttpError(404, 'not_found', 'No such load on this rig.');
  mayChangeLoad(rig, actor, old, 'update');
  // Saved as it was: nothing to write, no new version, no history entry.
  if (isDeepStrictEqual(stripLoad(old), load)) return { load: old, changed: false };
  const current = dto.loads.map(stripLoad);
  const next = dto.loads.map((l) => (l.id === loadId ? load : stripLoad(l)));
  validateModel(dto.power, next.map((l) => ({ ...l, status: 'installed' as const })));
  const { position: _p, added_by: _a, ...row } = loadToRow(load, 0, null);
  const edited = await db.transaction().execute(async (trx) => {
    const updated = await updateLoad(trx, rig.id, loadId, row);
    if (!updated) throw new HttpError(404, 'not_found', 'No such load on this rig.');
    await insertHistory(trx, {
      rigId: rig.id,
      actor,
      kind: 'load-edited',
      summary: `edited ${describeLoadEdit(stripLoad(old), load)}`,
      daysParkedBefore: daysParkedOf(dto.power, current),
      daysParkedAfter: daysParkedOf(dto.power, next),
    });
    return { load: loadFromRow(updated), changed: true };
  });
  rigChanged(ctx, rig.id);
  return edited;
}

export async function removeLoad(ctx: WriteCtx, rig: RigRowWithRole, actor: Actor, loadId: string) {
  const { db } = ctx;
  const dto = await readRig(db, rig);
  const old = dto.loads.find((l) => l.id === loadId);
  if (!old) throw new HttpError(404, 'not_found', 'No such load on this rig.');
  mayChangeLoad(rig, actor, old, 'delete');
  const current = dto.loads.map(stripLoad);
  await db.transaction().execute(async (trx) => {
    if (!(await deleteLoad(trx, rig.id, loadId))) throw new HttpError(404, 'not_found', 'No such load on this rig.');
    await insertHistory(trx, {
      rigId: rig.id,
      actor,
      kind: 'load-removed',
      summary: `removed ${describeLoad(stripLoad(old))}`,
      daysParkedBefore: daysParkedOf(dto.power, current),
      daysParkedAfter: daysParkedOf(
        dto.power,
        dto.loads.filter((l) => l.id !== loadId).map(stripLoad),
      ),
    });
  });
  rigChanged(ctx, rig.id);
}

/** Deletes the rig (no margin check: there is nothing left to check), then its logs and photos from object storage; returns the keys the store would not delete (left for the log). */
export async function removeRig(db: Db, storage: Storage, rigId: string): Promise<string[]> {
  const keys = await deleteRig(db, rigId);
  const left: string[] = [];
  for (const key of keys) await storage.remove(key).catch(() => left.push(key));
  return left;
}
