import type { ColumnType, Generated, Insertable, Selectable, Updateable } from 'kysely';

type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;

export interface HouseholdTable {
  id: Generated<string>;
  name: string;
  /** Stable key for seeded demo data, so seeding twice changes nothing. */
  seed_key: string | null;
  created_at: Generated<Timestamp>;
}

export interface RigTable {
  id: Generated<string>;
  household_id: string;
  name: string;
  vehicle: string;
  /** Battery bank, inverter, charging, routine and stay: the model's input minus the loads (shared/schemas/projection.ts). */
  power: ColumnType<unknown, string, string>;
  version: Generated<number>;
  seed_key: string | null;
  created_at: Generated<Timestamp>;
  updated_at: Generated<Timestamp>;
}

export interface LoadTable {
  id: Generated<string>;
  rig_id: string;
  name: string;
  supply: 'dc' | 'ac';
  watts: number | null;
  amps: number | null;
  duty_percent: number;
  hours_per_day: number;
  start_hour: number;
  when: 'always' | 'parked' | 'driving';
  status: 'installed' | 'candidate';
  quantity: number;
  position: number;
  created_at: Generated<Timestamp>;
  updated_at: Generated<Timestamp>;
}

export interface Database {
  households: HouseholdTable;
  rigs: RigTable;
  loads: LoadTable;
}

export type Household = Selectable<HouseholdTable>;
export type NewHousehold = Insertable<HouseholdTable>;
export type Rig = Selectable<RigTable>;
export type NewRig = Insertable<RigTable>;
export type RigUpdate = Updateable<RigTable>;
export type LoadRow = Selectable<LoadTable>;
export type NewLoad = Insertable<LoadTable>;
