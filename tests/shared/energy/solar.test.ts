import { describe, expect, it } from 'vitest';

import {
  dailySun,
  dayOfYear,
  daylightHours,
  daylightShares,
  extraterrestrialRadiation,
  inverseRelativeDistance,
  solarAmpsForDay,
  solarDeclination,
  sunsetHourAngle,
} from '@/shared/energy/solar';

// Every reference below is FAO Irrigation and Drainage Paper 56 (Allen, Pereira, Raes and Smith, 1998),
// chapter 3, as quoted in REFERENCES.md; the other cases are worked by hand from its equations.
const rad = (deg: number) => (deg * Math.PI) / 180;

describe('FAO-56 Example 8: 20° S on 3 September', () => {
  it('counts 3 September as day J = 246', () => {
    expect(dayOfYear('2026-09-03')).toBe(246);
  });

  it('gives dr = 0.985 (eq. 23), delta = 0.120 rad (eq. 24), ws = 1.527 rad (eq. 25)', () => {
    expect(inverseRelativeDistance(246)).toBeCloseTo(0.985, 3);
    expect(solarDeclination(246)).toBeCloseTo(0.12, 3);
    expect(sunsetHourAngle(rad(-20), solarDeclination(246))).toBeCloseTo(1.527, 3);
  });

  it('gives Ra = 32.2 MJ m-2 day-1 (eq. 21)', () => {
    expect(extraterrestrialRadiation(-20, 246)).toBeCloseTo(32.2, 1);
  });
});

describe('eq. 21 at other latitudes and dates, worked by hand', () => {
  it('at the equator on 21 March (J = 80): ws = pi/2, Ra = 37.59 dr cos(delta) = 37.82', () => {
    // dr = 1 + 0.033 cos(2 pi 80 / 365) = 1.00635; delta = 0.409 sin(1.3771 - 1.39) = -0.0053 rad.
    expect(sunsetHourAngle(0, solarDeclination(80))).toBeCloseTo(Math.PI / 2, 6);
    expect(extraterrestrialRadiation(0, 80)).toBeCloseTo(37.82, 1);
  });

  it('at 50° N on 21 June (J = 172): ws = 2.114 rad, N = 16.15 h, Ra = 41.8', () => {
    // delta = 0.409 sin(2.9608 - 1.39) = 0.409 rad; ws = arccos(-tan 50° tan 0.409) = arccos(-0.5169) = 2.114;
    // dr = 0.9676; Ra = 37.586 × 0.9676 × (2.114 × 0.7660 × 0.3977 + 0.6428 × 0.9175 × 0.8561) = 41.8.
    expect(sunsetHourAngle(rad(50), solarDeclination(172))).toBeCloseTo(2.114, 2);
    expect(daylightHours(50, 172)).toBeCloseTo(16.15, 1);
    expect(extraterrestrialRadiation(50, 172)).toBeCloseTo(41.8, 0);
  });

  it('at 50° N on 21 December (J = 355): ws = 1.028 rad, N = 7.85 h, Ra = 7.45', () => {
    // delta = -0.409 rad; ws = arccos(0.5169) = 1.0275; dr = 1.0325;
    // Ra = 37.586 × 1.0325 × (-1.0275 × 0.7660 × 0.3977 + 0.6428 × 0.9175 × 0.8561) = 7.45.
    expect(sunsetHourAngle(rad(50), solarDeclination(355))).toBeCloseTo(1.028, 2);
    expect(daylightHours(50, 355)).toBeCloseTo(7.85, 1);
    expect(extraterrestrialRadiation(50, 355)).toBeCloseTo(7.45, 1);
  });
});

describe('daylight hours (eq. 34)', () => {
  it('are near 12 h everywhere at an equinox (within 0.3 h to 60°: eq. 24 is a smooth fit of the declination)', () => {
    for (const lat of [-60, -35, 0, 20, 45, 60]) {
      expect(Math.abs(daylightHours(lat, dayOfYear('2026-03-20')) - 12)).toBeLessThan(0.3);
      expect(Math.abs(daylightHours(lat, dayOfYear('2026-09-23')) - 12)).toBeLessThan(0.3);
    }
  });

  it('are 0 in polar night and 24 under the midnight sun, with no NaN', () => {
    const night = dailySun({ latitudeDeg: 70, date: '2026-12-21' });
    expect(night).toEqual({ extraterrestrialMJ: 0, clearSkyMJ: 0, daylightHours: 0, peakSunHours: 0 });
    const midnightSun = dailySun({ latitudeDeg: 70, date: '2026-06-21' });
    expect(midnightSun.daylightHours).toBe(24);
    // Worked by hand: ws = pi, so Ra = 37.586 × 0.9676 × pi × sin 70° × sin 0.409 = 42.7.
    expect(midnightSun.extraterrestrialMJ).toBeCloseTo(42.7, 0);
    for (const lat of [-90, 90]) {
      for (const date of ['2026-03-20', '2026-06-21', '2026-12-21']) {
        const sun = dailySun({ latitudeDeg: lat, date });
        for (const v of Object.values(sun)) expect(Number.isFinite(v)).toBe(true);
      }
    }
    expect(solarAmpsForDay(night, 200, 0.75, 12).every((a) => a === 0)).toBe(true);
  });
});

describe('clear-sky radiation and peak sun hours (eq. 37)', () => {
  it('takes Rso = (0.75 + 2e-5 z) Ra and peak sun hours = Rso / 3.6 under a clear sky', () => {
    const sea = dailySun({ latitudeDeg: -20, date: '2026-09-03' });
    expect(sea.clearSkyMJ).toBeCloseTo(0.75 * 32.2, 0);
    expect(sea.peakSunHours).toBeCloseTo((0.75 * 32.2) / 3.6, 1);
    const high = dailySun({ latitudeDeg: -20, date: '2026-09-03', elevationM: 1000 });
    expect(high.clearSkyMJ / sea.clearSkyMJ).toBeCloseTo(0.77 / 0.75, 6);
  });

  it('scales with the sky the user picks (factors from memory)', () => {
    const clear = dailySun({ latitudeDeg: 45, date: '2026-07-01' });
    const overcast = dailySun({ latitudeDeg: 45, date: '2026-07-01', sky: 'overcast' });
    expect(overcast.peakSunHours).toBeCloseTo(clear.peakSunHours * 0.3, 6);
  });
});

describe('spreading the day over its daylight', () => {
  it('puts the whole day in the daylight hours, symmetric about noon', () => {
    const shares = daylightShares(8);
    expect(shares.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 9);
    expect(shares.slice(0, 8).every((s) => s === 0)).toBe(true);
    expect(shares.slice(16).every((s) => s === 0)).toBe(true);
    expect(shares[11]).toBeCloseTo(shares[12], 9);
  });

  it('puts back far less from 200 W at 50° N in December than in June', () => {
    const ah = (date: string) => solarAmpsForDay(dailySun({ latitudeDeg: 50, date }), 200, 0.75, 12).reduce((a, b) => a + b, 0);
    // By hand: June Rso = 0.75 × 41.8 = 31.3 MJ = 8.71 kWh/m²: 200 × 8.71 × 0.75 / 12 = 109 Ah;
    // December Rso = 0.75 × 7.45 = 5.59 MJ = 1.55 kWh/m²: 19.4 Ah.
    expect(ah('2026-06-21')).toBeCloseTo(109, -1);
    expect(ah('2026-12-21')).toBeCloseTo(19.4, 0);
    expect(ah('2026-12-21')).toBeLessThan(ah('2026-06-21') / 4);
  });
});
