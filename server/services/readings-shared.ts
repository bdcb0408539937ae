import type { Db } from '@/db/client';
import type { HistoryKind } from '@/db/schema';
import { rigPowerSchema } from '@/shared/schemas/projection';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { insertHistory } from '../repositories/history';
import { loadsOfRigs } from '../repositories/rigs';
import { type Actor, daysParkedOf } from './history';
import { loadFromRow } from './rigs-model';

// What the readings services share: spot readings (readings.ts), logs (readings-csv.ts), photos (readings-photos.ts).

/** A file name safe to show and to put in a header: letters, digits, dot, dash, underscore and spaces. */
export function cleanName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? 'file';
  const cleaned = base.normalize('NFKD').replace(/[^\w.\- ]+/g, '').replace(/\s+/g, ' ').replace(/^\.+/, '').trim().slice(0, 100);
  return cleaned || 'file';
}

/** A line in the rig's History: readings do not move the forecast, so Days parked shows no change. */
export async function recordReadingChange(db: Db, rig: RigAccess, actor: Actor, kind: HistoryKind, summary: string) {
  const days = daysParkedOf(rigPowerSchema.parse(rig.power), (await loadsOfRigs(db, [rig.id])).map(loadFromRow));
  await insertHistory(db, { rigId: rig.id, actor, kind, summary, daysParkedBefore: days, daysParkedAfter: days });
}

/** Who added something, or the owner, may delete it. */
export function mayDelete(rig: RigAccess, actor: Actor, createdBy: string | null) {
  if (rig.role !== 'owner' && createdBy !== actor.id) throw new HttpError(403, 'forbidden', 'Only the person who added it, or the owner of the rig, can delete it.');
}
