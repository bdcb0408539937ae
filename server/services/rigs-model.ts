import type { LoadRow } from '@/db/schema';
import { type Load, projectionInputSchema, type RigPower } from '@/shared/schemas/projection';

import type { SavedLoad } from '@/shared/api/loads';

export type { SavedLoad };

export function loadFromRow(row: LoadRow & { added_by_name?: string | null }): SavedLoad {
  return {
    id: row.id,
    name: row.name,
    supply: row.supply,
    ...(row.amps !== null ? { amps: row.amps } : { watts: row.watts ?? 0 }),
    dutyPercent: row.duty_percent,
    hoursPerDay: row.hours_per_day,
    ...(row.start_hour !== null ? { startHour: row.start_hour } : {}),
    ...(row.weekdays ? { weekdays: row.weekdays } : {}),
    when: row.when,
    status: row.status,
    quantity: row.quantity,
    ...(row.essential ? { essential: true } : {}),
    addedBy: row.added_by ? { id: row.added_by, name: row.added_by_name ?? '' } : null,
  };
}

export function loadToRow(load: Load, position: number, addedBy: string | null) {
  return {
    name: load.name,
    supply: load.supply,
    watts: load.amps === undefined ? (load.watts ?? 0) : null,
    amps: load.amps ?? null,
    duty_percent: load.dutyPercent,
    hours_per_day: load.hoursPerDay,
    start_hour: load.startHour ?? null,
    weekdays: load.weekdays ?? null,
    when: load.when,
    status: load.status,
    quantity: load.quantity,
    essential: load.essential ?? false,
    position,
    added_by: addedBy,
  };
}

export function modelInput(power: RigPower, loads: (Load | SavedLoad)[]) {
  return projectionInputSchema.parse({ ...power, loads: loads.map((l) => ('id' in l ? stripLoad(l) : l)) });
}

export const stripLoad = ({ id: _id, addedBy: _by, ...load }: SavedLoad): Load => load;
