import { type Comparison, compare } from '@/shared/energy/compare';
import { type LoadInput, projectionInputSchema } from '@/shared/schemas/projection';
import { tryLoadsSchema } from '@/shared/schemas/rig';
import type { Rig } from '../api/rig';

/** Try a load's answer, with where it was worked out: on the server (the authority) or on this device. */
export type TryResult = Comparison & { onDevice: boolean };

/**
 * Try a load without the server: the same pure model (shared/energy `compare`) on the last saved rig this
 * device has, with the candidates read through the same schema the server uses. Online the server answers;
 * this runs only when there is no connection (tests/server/try-on-device.test.ts holds the two together).
 */
export function tryOnDevice(rig: Pick<Rig, 'power' | 'loads'>, candidates: LoadInput[]): Comparison {
  const model = projectionInputSchema.parse({ ...rig.power, loads: rig.loads.map(({ id: _id, addedBy: _by, ...load }) => load) });
  return compare({ rig: model, candidates: tryLoadsSchema.parse({ candidates }).candidates });
}
