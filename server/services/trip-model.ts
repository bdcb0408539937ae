import type { Selectable } from 'kysely';

import type { Db } from '@/db/client';
import type { TripTable } from '@/db/schema';
import { projectTrip } from '@/shared/energy/trip';
import type { ProjectionInput } from '@/shared/schemas/projection';
import { type Trip, tripSchema } from '@/shared/schemas/trip';
import { activeTripsOf } from '../repositories/trips';

type Row = Selectable<TripTable>;

/** A stored trip as the API shows it (the plan re-read through the trip schema). */
export function tripFromRow(row: Row): Trip & { id: string } {
  const plan = row.plan as Record<string, unknown>;
  return { id: row.id, ...tripSchema.parse({ ...plan, name: row.name, startDate: row.start_date, active: row.active }) };
}

/** The active trip of each rig, for the Outlook and the e-mails. */
export async function activeTrips(db: Db, rigIds: string[]) {
  return new Map((await activeTripsOf(db, rigIds)).map((row) => [row.rig_id, tripFromRow(row)]));
}

/** The active trip's outlook over a rig's model input, or null. */
export function activeTripOutlook(input: ProjectionInput, trip: (Trip & { id: string }) | undefined, options: { fixes?: boolean } = {}) {
  return trip ? { tripId: trip.id, name: trip.name, ...projectTrip(input, trip, options) } : null;
}
