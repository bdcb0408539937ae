import type { Db } from '@/db/client';
import type { UnitsBody } from '@/shared/schemas/units';
import { DEFAULT_ENERGY_UNIT, type EnergyUnit } from '@/shared/units';
import { findUnitPrefs, upsertUnitPrefs } from '../repositories/users';

/** The person's units as the account keeps them; saved is false while they never chose (Ah then). */
export async function unitsOf(db: Db, userId: string): Promise<{ energy: EnergyUnit; saved: boolean }> {
  const row = await findUnitPrefs(db, userId);
  return row ? { energy: row.energy, saved: true } : { energy: DEFAULT_ENERGY_UNIT, saved: false };
}

export async function saveUnits(db: Db, userId: string, units: UnitsBody) {
  await upsertUnitPrefs(db, userId, units.energy);
  return unitsOf(db, userId);
}
