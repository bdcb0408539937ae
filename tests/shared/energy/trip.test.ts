import { describe, expect, it } from 'vitest';

import { projectTrip, stayBatteryTemperature, tripTimeline } from '@/shared/energy/trip';
import { projectionInputSchema } from '@/shared/schemas/projection';
import { tripSchema } from '@/shared/schemas/trip';

// A rig simple enough to work by hand: 100 Ah AGM, no Peukert effect, no self-discharge, every amp of
// charge stored, a 0.3 A load all the time, a 20 A alternator, no solar.
const rig = projectionInputSchema.parse({
  battery: { chemistry: 'agm', capacityAh: 100, peukertExponent: 1, selfDischargePercentPerMonth: 0, chargeEfficiencyPercent: 100 },
  loads: [{ name: 'Fridge', supply: 'dc', amps: 0.3, hoursPerDay: 24 }],
  charging: { alternatorA: 20 },
});
// Friday 5 June 2026: three hours' drive at 10:00, five nights at the lake (25 °C), an hour's drive on the
// morning of the 10th, two nights at a farm at -20 to -16 °C; stays begin and end at 15:00.
const trip = tripSchema.parse({
  name: 'Lake and farm',
  startDate: '2026-06-05',
  legs: [
    { kind: 'drive', date: '2026-06-05', startHour: 10, minutes: 180 },
    { kind: 'stay', name: 'Lake', latitudeDeg: 47, nights: 5, lowC: 25, highC: 25 },
    { kind: 'drive', date: '2026-06-10', startHour: 10, minutes: 60 },
    { kind: 'stay', name: 'Farm', latitudeDeg: 47, nights: 2, lowC: -20, highC: -16 },
  ],
});

describe('a trip of two stays and a drive, worked by hand', () => {
  const out = projectTrip(rig, trip);
  const [lake, farm] = out.stays;

  it('places the legs: the run starts with the 10:00 drive, the lake from hour 5 to 125, the farm to 173', () => {
    const tl = tripTimeline(trip);
    expect(tl.startHour).toBe(10);
    expect(tl.stays.map((s) => [s.from, s.to])).toEqual([[5, 125], [125, 173]]);
    expect(tl.drives.map((d) => d.from)).toEqual([0, 120]);
    expect(lake.arriveAt).toBe('2026-06-05T15:00');
    expect(farm.leaveAt).toBe('2026-06-12T15:00');
  });

  it('arrives at the lake at 99.4 %: full after the drive, then 2 h × 0.3 A', () => {
    expect(lake.socOnArrivalPercent).toBeCloseTo(99.4, 1);
  });

  it('leaves the lake at 83.4 %: 115 h × 0.3 A out, the hour\'s drive puts back 19.7 Ah, 4 h more out', () => {
    // 99.4 - 34.5 = 64.9; + (20 - 0.3) = 84.6; - 1.2 = 83.4 (the alternator's 19.7 A stays under the AGM's
    // 30 A bulk acceptance, less as it tapers above 80 %: still about 24 A at 85 %).
    expect(lake.socOnLeavingPercent).toBeCloseTo(83.4, 1);
    expect(lake.lowestSocPercent).toBeCloseTo(64.9, 1);
  });

  it('gives the lake its margin: (99.4 - 50) % of 100 Ah at 0.3 A = 6.86 days, 1.86 beyond 5 nights: Comfortable', () => {
    expect(lake.daysToCutoff).toBeCloseTo(6.86, 1);
    expect(lake.marginDays).toBeCloseTo(1.86, 1);
    expect(lake.marginState).toBe('comfortable');
  });

  it('takes the farm\'s cold: -18 °C leaves 40 % of the capacity (US Army TM 10-6140-200-14, 1-9a)', () => {
    expect(farm.batteryTemperatureC).toBe(-18);
    expect(farm.temperatureFactor).toBeCloseTo(0.4, 3);
    // The state of charge carries over: 83.4 % of 40 Ah; 48 h × 0.3 A = 14.4 Ah = 36 points.
    expect(farm.socOnArrivalPercent).toBeCloseTo(83.4, 1);
    expect(farm.socOnLeavingPercent).toBeCloseTo(47.4, 1);
  });

  it('finds the farm Short: 33.4 % of 40 Ah at 0.3 A = 1.86 days for 2 nights', () => {
    expect(farm.daysToCutoff).toBeCloseTo(1.86, 1);
    expect(farm.marginDays).toBeCloseTo(-0.14, 1);
    expect(farm.marginState).toBe('short');
    expect(out.marginState).toBe('short');
    expect(out.tightestStay).toBe('Farm');
    expect(out.fixes.length).toBeGreaterThan(0);
  });

  it('draws the charge hour by hour through the legs', () => {
    expect(out.series).toHaveLength(173);
    expect(out.series[4].socPercent).toBeCloseTo(99.4, 1);
    expect(out.series[172].stay).toBe(1);
    expect(out.endSocPercent).toBeCloseTo(47.4, 1);
  });
});

describe('temperatures by stay', () => {
  it('warms a battery in the cabin by 8 °C over the day\'s mean outside (from memory)', () => {
    expect(stayBatteryTemperature({ lowC: -6, highC: 2 }, false)).toBe(-2);
    expect(stayBatteryTemperature({ lowC: -6, highC: 2 }, true)).toBe(6);
    const warm = projectTrip(rig, { ...trip, batteryInCabin: true }, { fixes: false });
    expect(warm.stays[1].temperatureFactor).toBeGreaterThan(0.4);
    expect(warm.stays[1].daysToCutoff ?? 99).toBeGreaterThan(1.86);
  });

  it('puts shore power to work at a stay that has it', () => {
    const shore = tripSchema.parse({ ...trip, legs: trip.legs.map((l) => (l.kind === 'stay' && l.name === 'Farm' ? { ...l, shore: true } : l)) });
    const out = projectTrip(rig, shore, { fixes: false });
    expect(out.stays[1].socOnLeavingPercent).toBe(100);
    expect(out.stays[1].marginState).toBe('comfortable');
  });
});

describe('trip validation', () => {
  it('names a drive outside the trip and a high below the low', () => {
    const res = tripSchema.safeParse({
      name: 'x',
      startDate: '2026-06-05',
      legs: [
        { kind: 'stay', name: 'Lake', latitudeDeg: 47, nights: 2, lowC: 10, highC: 5 },
        { kind: 'drive', date: '2026-06-20', minutes: 30 },
      ],
    });
    expect(res.success).toBe(false);
    expect(res.error!.issues.map((i) => i.path.join('.'))).toEqual(expect.arrayContaining(['legs.0.highC', 'legs.1.date']));
  });
});
