/**
 * The sun by place and date, from FAO Irrigation and Drainage Paper 56 (Allen, Pereira, Raes and Smith, 1998),
 * chapter 3: extraterrestrial radiation (eqs. 21-25), daylight hours (eq. 34) and clear-sky radiation (eq. 37).
 * Pure functions: angles in radians inside, degrees at the edges.
 */

/** Solar constant, MJ m-2 min-1 (FAO-56, eq. 21). */
export const SOLAR_CONSTANT = 0.082;
/** 1 kWh/m² = 3.6 MJ/m²: a peak sun hour is 1 kWh/m² on the panel. */
export const MJ_PER_KWH = 3.6;

/**
 * Share of the clear-sky radiation reaching the panel under each sky the user picks (from memory:
 * daily Rs/Rso runs near 1 on clear days, about two thirds on mixed days, a quarter to a third overcast).
 */
export const SKY_FACTORS = { clear: 1, mixed: 0.65, overcast: 0.3 } as const;
export type Sky = keyof typeof SKY_FACTORS;

const DEG = Math.PI / 180;

/** Day of the year J (1 on 1 January) of an ISO date (YYYY-MM-DD), as FAO-56 counts it. */
export function dayOfYear(isoDate: string): number {
  const [y, m, d] = isoDate.split('-').map(Number);
  return Math.round((Date.UTC(y, m - 1, d) - Date.UTC(y, 0, 1)) / 86_400_000) + 1;
}

/** Eq. 23: inverse relative distance Earth-Sun. */
export const inverseRelativeDistance = (J: number) => 1 + 0.033 * Math.cos((2 * Math.PI * J) / 365);

/** Eq. 24: solar declination, rad. */
export const solarDeclination = (J: number) => 0.409 * Math.sin((2 * Math.PI * J) / 365 - 1.39);

/**
 * Eq. 25: sunset hour angle, rad. Beyond the polar circles the argument leaves [-1, 1]: held there, the sun
 * never rises (0, polar night) or never sets (pi, midnight sun) instead of giving NaN.
 */
export function sunsetHourAngle(latitudeRad: number, declinationRad: number): number {
  const x = -Math.tan(latitudeRad) * Math.tan(declinationRad);
  return Math.acos(x > 1 ? 1 : x < -1 ? -1 : x);
}

/** Eq. 21: extraterrestrial radiation for a day, MJ m-2 day-1. */
export function extraterrestrialRadiation(latitudeDeg: number, J: number): number {
  const phi = latitudeDeg * DEG;
  const dr = inverseRelativeDistance(J);
  const delta = solarDeclination(J);
  const ws = sunsetHourAngle(phi, delta);
  const ra =
    ((24 * 60) / Math.PI) * SOLAR_CONSTANT * dr * (ws * Math.sin(phi) * Math.sin(delta) + Math.cos(phi) * Math.cos(delta) * Math.sin(ws));
  // At the poles cos(phi) is a rounding error away from 0: never a negative radiation.
  return ra > 0 ? ra : 0;
}

/** Eq. 34: daylight hours N = 24 ws / pi. */
export function daylightHours(latitudeDeg: number, J: number): number {
  return (24 / Math.PI) * sunsetHourAngle(latitudeDeg * DEG, solarDeclination(J));
}

/** Eq. 37: clear-sky radiation Rso = (0.75 + 2e-5 z) Ra, z the elevation above sea level in metres. */
export const clearSkyRadiation = (ra: number, elevationM = 0) => (0.75 + 2e-5 * elevationM) * ra;

export type DailySun = {
  extraterrestrialMJ: number;
  clearSkyMJ: number;
  daylightHours: number;
  /** Rso in kWh/m² times the sky's factor: hours of 1 kW/m² on the panel. */
  peakSunHours: number;
};

/** The sun of one day at a place: eqs. 21, 34 and 37, and the peak sun hours under the chosen sky. */
export function dailySun(p: { latitudeDeg: number; date: string; elevationM?: number; sky?: Sky }): DailySun {
  const J = dayOfYear(p.date);
  const ra = extraterrestrialRadiation(p.latitudeDeg, J);
  const rso = clearSkyRadiation(ra, p.elevationM ?? 0);
  return {
    extraterrestrialMJ: ra,
    clearSkyMJ: rso,
    daylightHours: daylightHours(p.latitudeDeg, J),
    peakSunHours: (rso / MJ_PER_KWH) * SKY_FACTORS[p.sky ?? 'clear'],
  };
}

/**
 * The day's sun spread over its real daylight: a half sine from sunrise (12 - N/2) to sunset (12 + N/2)
 * around solar noon at 12:00 (model choice: clock time is taken as local solar time). Returns the share of
 * the day's energy in each hour of the day (0 to 23), summing to 1, or all zeros in polar night.
 */
export function daylightShares(daylight: number): number[] {
  const out = [0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0];
  if (!(daylight > 1e-6)) return out;
  const n = Math.min(24, daylight);
  const rise = 12 - n / 2;
  const set = 12 + n / 2;
  // Integral of sin(pi (x - rise) / n) over [a, b], over its integral over the whole day (2 n / pi).
  const cum = (x: number) => -Math.cos((Math.PI * (Math.min(set, Math.max(rise, x)) - rise)) / n);
  for (let h = 0; h < 24; h++) out[h] = (cum(h + 1) - cum(h)) / 2;
  return out;
}

/** Battery-side solar current in each hour of one day: W × peak sun hours × derate / V, spread over daylight. */
export function solarAmpsForDay(sun: DailySun, watts: number, derate: number, systemVoltage: number): number[] {
  const dailyAh = (watts * sun.peakSunHours * derate) / systemVoltage;
  return daylightShares(sun.daylightHours).map((s) => s * dailyAh);
}

/** The ISO date `days` after an ISO date. */
export function addDays(isoDate: string, days: number): string {
  const [y, m, d] = isoDate.split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d + days)).toISOString().slice(0, 10);
}

/** Day of the week of an ISO date, Monday = 0 (the model's weekday). */
export function weekdayOf(isoDate: string): number {
  const [y, m, d] = isoDate.split('-').map(Number);
  return (new Date(Date.UTC(y, m - 1, d)).getUTCDay() + 6) % 7;
}
