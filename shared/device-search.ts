import type { Device, DeviceCategory } from './devices';

// Kept apart from the catalogue itself so the app can search what GET /api/devices sent without bundling it.

/** Devices of a list whose name, category or note contains every word of the query (case-insensitive); all when empty. */
export function filterDevices<D extends Device>(list: readonly D[], query: string, category?: DeviceCategory, limit = list.length): D[] {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  return list
    .filter((dev) => {
      if (category && dev.category !== category) return false;
      const text = `${dev.name} ${dev.category} ${dev.note} ${dev.load.supply === 'ac' ? 'ac inverter' : 'dc 12 v'}`.toLowerCase();
      return words.every((w) => text.includes(w));
    })
    .slice(0, limit);
}
