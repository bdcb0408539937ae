import type { ProjectionInputRaw } from '@/shared/schemas/projection';

/** A plain 100 Ah battery with self-discharge switched off, so hand arithmetic stays exact. */
export function bareRig(over: Partial<ProjectionInputRaw> = {}, battery: Partial<ProjectionInputRaw['battery']> = {}): ProjectionInputRaw {
  return {
    systemVoltage: 12,
    battery: { chemistry: 'agm', capacityAh: 100, temperatureC: 25, selfDischargePercentPerMonth: 0, cutoffSocPercent: 50, ...battery },
    inverter: null,
    loads: [],
    horizonDays: 14,
    start: { weekday: 0, hour: 0 },
    ...over,
  };
}
