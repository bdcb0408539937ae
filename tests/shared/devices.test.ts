import { describe, expect, it } from 'vitest';

import { DEVICES, searchDevices } from '@/shared/devices';
import { loadSchema, projectionInputSchema } from '@/shared/schemas/projection';

// The catalogue's figures are typical ones, each marked in shared/devices.ts as "common practice" or "from
// memory"; these tests hold the entries to the load schema and to a few published bounds.
describe('the device catalogue', () => {
  it('has at least 80 devices, each with a unique id and name', () => {
    expect(DEVICES.length).toBeGreaterThanOrEqual(80);
    expect(new Set(DEVICES.map((d) => d.id)).size).toBe(DEVICES.length);
    expect(new Set(DEVICES.map((d) => d.name)).size).toBe(DEVICES.length);
  });

  it('validates every entry against the load schema the form and the server use', () => {
    for (const d of DEVICES) {
      const r = loadSchema.safeParse(d.load);
      expect(r.success, `${d.id}: ${r.success ? '' : JSON.stringify(r.error.issues)}`).toBe(true);
    }
  });

  it('runs every entry through the model input schema of a rig with an inverter', () => {
    const r = projectionInputSchema.safeParse({ battery: { chemistry: 'agm', capacityAh: 100 }, inverter: { ratedW: 2000 }, loads: DEVICES.map((d) => d.load) });
    expect(r.success).toBe(true);
  });

  it('says where each figure comes from and names no brand', () => {
    for (const d of DEVICES) {
      expect(['common practice', 'from memory']).toContain(d.source);
      expect(d.note.length).toBeGreaterThan(5);
    }
  });

  it('covers the kinds of device travellers ask about', () => {
    const names = DEVICES.map((d) => d.name.toLowerCase()).join('\n');
    for (const word of ['compressor fridge', 'thermoelectric', 'led', 'fan', 'glow plug', 'cpap machine, humidifier off', 'cpap machine with heated humidifier', 'laptop', 'phone', 'tablet', 'camera', 'drone', 'router', 'tv', 'kettle', 'induction', 'microwave', 'coffee', 'hair dryer', 'tool', 'e-bike', 'water pump']) {
      expect(names, word).toContain(word);
    }
  });

  it('keeps the published rule of thumb for an inverter-fed kettle: well over 100 A at 12 V (1,500 W / (12 V x 0.9), Home Power 90 %)', () => {
    const kettle = DEVICES.find((d) => d.id === 'kettle')!;
    expect(kettle.load.supply).toBe('ac');
    expect((kettle.load.watts ?? 0) / (12 * 0.9)).toBeGreaterThan(100);
  });

  it('finds devices by every word of a query, in any case', () => {
    expect(searchDevices('CPAP').map((d) => d.id)).toEqual(['cpap-no-humidifier', 'cpap-humidifier', 'cpap-on-inverter']);
    expect(searchDevices('compressor fridge').every((d) => /compressor/i.test(d.name) && /fridge/i.test(d.name))).toBe(true);
    expect(searchDevices('no such device at all')).toEqual([]);
    expect(searchDevices('')).toHaveLength(DEVICES.length);
  });
});
