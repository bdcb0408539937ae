import type { Db } from '@/db/client';
import { planHookup } from '@/shared/energy/hookup/plan';
import { hookupInputSchema, type RigHookupQuery } from '@/shared/schemas/hookup';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { listCableRuns } from '../repositories/cable-runs';
import { readRig } from './rigs';

/**
 * A saved rig's hook-up plan: its power system, the length and return of its saved inverter feed (a cable
 * run marked as the inverter's) where it has one, and the query's changes (a Fix's control, say).
 */
export async function rigHookup(db: Db, rig: RigAccess, query: RigHookupQuery) {
  const dto = await readRig(db, rig);
  const inverter = dto.power.inverter;
  if (!inverter) throw new HttpError(404, 'not_found', 'This rig has no inverter to hook up.');
  const feed = (await listCableRuns(db, rig.id)).find((r) => r.purpose === 'inverter');
  const input = hookupInputSchema.parse({
    ...dto.power,
    inverter: { ...inverter, ...(query.control ? { control: query.control } : {}), ...(query.connection ? { connection: query.connection } : {}) },
    feedLengthM: query.feedLengthM ?? (feed ? Math.min(30, feed.length_m) : undefined),
    returnPath: query.returnPath ?? feed?.return_path,
    insulationC: feed?.insulation_c,
    engineSpace: feed?.engine_space,
    switchAt: query.switchAt,
    remoteOnOff: query.remoteOnOff,
  });
  return { rigId: dto.id, version: dto.version, feedRun: feed ? { id: feed.id, label: feed.label } : null, ...planHookup(input) };
}
