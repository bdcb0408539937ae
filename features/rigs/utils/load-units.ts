import type { Device } from '@/shared/devices';
import type { Load } from '@/shared/schemas/projection';

/** A catalogue device as a load to adjust before adding. */
export function fromDevice(d: Device, systemVoltage: number): Load {
  return asWatts({ ...d.load, dutyPercent: d.load.dutyPercent ?? 100, when: d.load.when ?? 'always', status: d.load.status ?? 'installed', quantity: d.load.quantity ?? 1 }, systemVoltage);
}

/** The form edits watts; a load saved in amps is shown as its watts at the system voltage. */
export function asWatts(load: Load, systemVoltage: number): Load {
  if (load.amps === undefined) return load;
  const { amps, ...rest } = load;
  return { ...rest, watts: Math.round(amps * systemVoltage * 10) / 10 };
}
