import type { Load } from '@/shared/schemas/projection';

/** Typical devices to tick when setting up a rig; every figure can be edited afterwards (common practice). */
export const COMMON_LOADS: { key: string; label: string; load: Load }[] = [
  { key: 'fridge', label: 'Compressor fridge, 40 W at 35 %', load: { name: 'Compressor fridge', supply: 'dc', watts: 40, dutyPercent: 35, hoursPerDay: 24, when: 'always', status: 'installed', quantity: 1 } },
  { key: 'lights', label: 'LED lights, 10 W for 4 h', load: { name: 'LED lights', supply: 'dc', watts: 10, dutyPercent: 100, hoursPerDay: 4, startHour: 18, when: 'parked', status: 'installed', quantity: 1 } },
  { key: 'phones', label: 'Phone charging, 10 W for 2 h', load: { name: 'Phone charging', supply: 'dc', watts: 10, dutyPercent: 100, hoursPerDay: 2, startHour: 21, when: 'always', status: 'installed', quantity: 1 } },
  { key: 'fan', label: 'Roof fan, 20 W at half speed for 8 h', load: { name: 'Roof fan', supply: 'dc', watts: 20, dutyPercent: 50, hoursPerDay: 8, startHour: 22, when: 'parked', status: 'installed', quantity: 1 } },
  { key: 'laptop', label: 'Laptop on the inverter, 60 W for 3 h', load: { name: 'Laptop', supply: 'ac', watts: 60, dutyPercent: 70, hoursPerDay: 3, startHour: 14, when: 'parked', status: 'installed', quantity: 1 } },
  { key: 'heater', label: 'Diesel heater fan, 1 A for 6 h', load: { name: 'Diesel heater fan', supply: 'dc', amps: 1, dutyPercent: 100, hoursPerDay: 6, startHour: 23, when: 'parked', status: 'installed', quantity: 1 } },
  { key: 'cpap', label: 'CPAP machine, 30 W for 8 h', load: { name: 'CPAP machine', supply: 'dc', watts: 30, dutyPercent: 100, hoursPerDay: 8, startHour: 23, when: 'parked', status: 'installed', quantity: 1, essential: true } },
];
