import type { Selectable, Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database, TripTable } from '@/db/schema';
import { projectTrip } from '@/shared/energy/trip';
import type { Trip } from '@/shared/schemas/trip';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { touchRig } from '../repositories/rigs';
import { clearActive, deleteTrip, findTrip, insertTrip, listTrips, updateTrip } from '../repositories/trips';
import { rigChanged, type WriteCtx } from './rig-changed';
import { readRig } from './rigs';
import { modelInput } from './rigs-model';
import { tripFromRow } from './trip-model';

type Row = Selectable<TripTable>;

const toValues = (trip: Trip) => ({
  name: trip.name,
  start_date: trip.startDate,
  active: trip.active,
  plan: JSON.stringify({ arrivalHour: trip.arrivalHour, batteryInCabin: trip.batteryInCabin, legs: trip.legs }),
});

/** The places of a rig's stays, latest trip first, each once: what the Trips screen offers to pick again. */
function recentPlaces(trips: (Trip & { id: string })[]) {
  const seen = new Map<string, { name: string; latitudeDeg: number; elevationM?: number }>();
  for (const t of trips) {
    for (const leg of t.legs) {
      const key = leg.kind === 'stay' ? leg.name.toLowerCase() : '';
      if (leg.kind === 'stay' && !seen.has(key)) seen.set(key, { name: leg.name, latitudeDeg: leg.latitudeDeg, ...(leg.elevationM !== undefined ? { elevationM: leg.elevationM } : {}) });
    }
  }
  return [...seen.values()].slice(0, 12);
}

export async function tripsOf(db: Db, rig: RigAccess) {
  const trips = (await listTrips(db, rig.id)).map(tripFromRow);
  return { trips, recentPlaces: recentPlaces(trips) };
}

/** Writes a trip and moves the rig on a version (the cached Outlook follows the active trip). */
async function save(ctx: WriteCtx, rig: RigAccess, trip: Trip, write: (trx: Transaction<Database>) => Promise<Row | undefined>) {
  try {
    const saved = await ctx.db.transaction().execute(async (trx) => {
      const row = await write(trx);
      if (!row) throw new HttpError(404, 'not_found', 'No such trip on this rig.');
      if (trip.active) await clearActive(trx, rig.id, row.id);
      await touchRig(trx, rig.id);
      return tripFromRow(row);
    });
    rigChanged(ctx, rig.id);
    return saved;
  } catch (err) {
    // Two trips made active at the same moment: the unique index keeps one; the other is told to retry.
    if ((err as { code?: string }).code === '23505') throw new HttpError(409, 'conflict', 'Another trip was made active at the same moment; reload and try again.');
    throw err;
  }
}

export async function addTrip(ctx: WriteCtx, rig: RigAccess, userId: string, trip: Trip) {
  return save(ctx, rig, trip, async (trx) => {
    if (trip.active) await clearActive(trx, rig.id);
    return insertTrip(trx, rig.id, userId, toValues(trip));
  });
}

export async function editTrip(ctx: WriteCtx, rig: RigAccess, tripId: string, trip: Trip) {
  return save(ctx, rig, trip, async (trx) => {
    if (trip.active) await clearActive(trx, rig.id, tripId);
    return updateTrip(trx, rig.id, tripId, toValues(trip));
  });
}

export async function removeTrip(ctx: WriteCtx, rig: RigAccess, tripId: string) {
  await ctx.db.transaction().execute(async (trx) => {
    if (!(await deleteTrip(trx, rig.id, tripId))) throw new HttpError(404, 'not_found', 'No such trip on this rig.');
    await touchRig(trx, rig.id);
  });
  rigChanged(ctx, rig.id);
}

export async function tripOutlook(db: Db, rig: RigAccess, tripId: string) {
  const row = await findTrip(db, rig.id, tripId);
  if (!row) throw new HttpError(404, 'not_found', 'No such trip on this rig.');
  const dto = await readRig(db, rig);
  const trip = tripFromRow(row);
  return { tripId: trip.id, name: trip.name, ...projectTrip(modelInput(dto.power, dto.loads), trip) };
}
