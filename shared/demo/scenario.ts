import type { LoadInput, ProjectionInputRaw } from '../schemas/projection';

// The invented demo scenario of the product: the Halloran-Okafor household, their van Wren and their
// hatchback Stoat. Seeds, examples and tests take their data from here.

export const DEMO_HOUSEHOLD = { slug: 'halloran-okafor', name: 'Halloran-Okafor household' } as const;

/** Every demo account signs in with this password (local demo data only). */
export const DEMO_PASSWORD = 'keyoff-demo-2026';

export const DEMO_PEOPLE = [
  { key: 'ines', name: 'Ines Halloran-Okafor', email: 'ines@example.org', accountRole: 'traveller', householdRole: 'owner' },
  { key: 'tobi', name: 'Tobi Halloran-Okafor', email: 'tobi@example.org', accountRole: 'traveller', householdRole: 'member' },
  { key: 'marguerite', name: 'Marguerite Vance', email: 'marguerite@example.org', accountRole: 'advisor', householdRole: 'advisor' },
  { key: 'dara', name: 'Dara Finchley', email: 'dara@example.org', accountRole: 'traveller', householdRole: null },
  { key: 'admin', name: 'Keyoff Admin', email: 'admin@example.org', accountRole: 'admin', householdRole: null },
] as const;
export type DemoPersonKey = (typeof DEMO_PEOPLE)[number]['key'];

export const WREN_LOADS: LoadInput[] = [
  { name: 'Compressor fridge (40 L)', supply: 'dc', watts: 36, dutyPercent: 30, hoursPerDay: 24, when: 'always' },
  { name: 'LED strip lights', supply: 'dc', watts: 8, hoursPerDay: 3, startHour: 19, when: 'parked' },
  { name: 'Roof fan', supply: 'dc', watts: 18, dutyPercent: 40, hoursPerDay: 6, startHour: 22, when: 'parked' },
  { name: 'Two phones', supply: 'dc', watts: 7.5, hoursPerDay: 1.5, startHour: 21, quantity: 2 },
  { name: 'Laptop', supply: 'ac', watts: 45, dutyPercent: 60, hoursPerDay: 2, startHour: 14, when: 'parked' },
  { name: 'Diesel heater fan', supply: 'dc', amps: 0.8, hoursPerDay: 4, startHour: 23, when: 'parked' },
];

/** Wren: the five-day lake stay, starting Monday 18:00, with one 40-minute drive on Wednesday. */
export const WREN: ProjectionInputRaw = {
  systemVoltage: 12,
  battery: { chemistry: 'agm', capacityAh: 100, healthPercent: 100, temperatureC: 22, startSocPercent: 100, role: 'house' },
  inverter: { ratedW: 300, efficiencyPercent: 90, idleA: 0.45, control: 'always-on' },
  keyOffDrawA: 0.03,
  loads: WREN_LOADS,
  charging: { alternatorA: 20, charger: 'relay', drivingMinutesPerDay: [0, 0, 40, 0, 0, 0, 0], drivingStartHour: 11, solarW: 0, peakSunHours: 0 },
  plannedStayDays: 5,
  horizonDays: 14,
  start: { weekday: 0, hour: 18 },
};

/** Which member added which of Wren's loads (the rest are Ines's). */
export const WREN_ADDED_BY: Record<string, DemoPersonKey> = { 'Two phones': 'tobi', Laptop: 'tobi' };

export const STOAT_LOADS: LoadInput[] = [
  { name: 'Phone charger', supply: 'dc', watts: 10, hoursPerDay: 2, startHour: 21 },
  { name: 'Laptop', supply: 'ac', watts: 45, hoursPerDay: 2, startHour: 19, when: 'parked' },
];

/** Stoat: a small hatchback with a lighter-socket inverter left plugged into the starting battery. */
export const STOAT: ProjectionInputRaw = {
  systemVoltage: 12,
  battery: { chemistry: 'flooded', capacityAh: 45, healthPercent: 90, temperatureC: 10, startSocPercent: 95, role: 'starter' },
  inverter: { ratedW: 150, efficiencyPercent: 88, idleA: 0.3, control: 'always-on', connection: 'socket', socketFuseA: 15, socketSwitched: false },
  keyOffDrawA: 0.04,
  loads: STOAT_LOADS,
  charging: { alternatorA: 30, charger: 'relay', drivingMinutesPerDay: [30, 30, 30, 30, 30, 0, 0], drivingStartHour: 8, solarW: 0, peakSunHours: 0 },
  plannedStayDays: 2,
  horizonDays: 14,
  start: { weekday: 4, hour: 18 },
};
