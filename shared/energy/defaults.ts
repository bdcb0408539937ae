import type { Chemistry } from '../schemas/projection';

/**
 * Every default the model uses, with where it comes from. docs/model.md shows the same table; every
 * value can be overridden in the input. "common practice" means no single published source; "from
 * memory" means a remembered figure that a source should confirm.
 */
export type ChemistryDefaults = {
  peukertExponent: number;
  chargeEfficiency: number;
  selfDischargePercentPerMonth: number;
  cutoffSocHouse: number;
  cutoffSocStarter: number;
  bulkAcceptanceC: number;
  taperStartSoc: number;
  /** Capacity factor by temperature, as [°C, factor] points, interpolated. */
  temperatureCurve: readonly (readonly [number, number])[];
};

// US Army TM 10-6140-200-14, 1-9a: about 75 % of capacity at 0 °C and 40 % at -18 °C (lead-acid).
// Below -18 °C the curve keeps falling, in proportion to the cranking power of TM 5-4210-230-14&P-1
// Table 3 (40 % at -18 °C, 20 % at -29 °C): 0.2 at -29 °C (model choice), and 0.05 at -40 °C, the floor
// (model choice: the -18 to -29 °C slope reaches 0 near -40 °C).
const LEAD_ACID_TEMPERATURE = [
  [-40, 0.05],
  [-29, 0.2],
  [-18, 0.4],
  [0, 0.75],
  [25, 1],
] as const;

// LiFePO4 loses less capacity in the cold (from memory: about 90 % at 0 °C, 70 % at -20 °C).
const LIFEPO4_TEMPERATURE = [
  [-20, 0.7],
  [0, 0.9],
  [25, 1],
] as const;

export const CHEMISTRY_DEFAULTS: Record<Chemistry, ChemistryDefaults> = {
  flooded: {
    peukertExponent: 1.25, // typical 1.2 to 1.3 (REFERENCES: from memory)
    chargeEfficiency: 0.85, // 0.80 to 0.90 (common practice)
    selfDischargePercentPerMonth: 10, // 5 to 15 % by storage temperature (common practice)
    cutoffSocHouse: 50, // about 50 % depth of discharge for lead-acid (common practice)
    cutoffSocStarter: 75, // cranking reserve (common practice)
    bulkAcceptanceC: 0.2, // 0.1 to 0.3 C in bulk (from memory)
    taperStartSoc: 80, // absorption begins near 80 % (from memory)
    temperatureCurve: LEAD_ACID_TEMPERATURE,
  },
  agm: {
    peukertExponent: 1.1, // typical 1.05 to 1.15 (from memory)
    chargeEfficiency: 0.9, // upper end of lead-acid 0.80 to 0.90 (common practice)
    selfDischargePercentPerMonth: 5, // lead-acid 4 to 6 % (Darling, Encyclopedia of Alternative Energy)
    cutoffSocHouse: 50,
    cutoffSocStarter: 75,
    bulkAcceptanceC: 0.3, // AGM accepts the top of 0.1 to 0.3 C (from memory)
    taperStartSoc: 80,
    temperatureCurve: LEAD_ACID_TEMPERATURE,
  },
  gel: {
    peukertExponent: 1.12, // between AGM and flooded (from memory)
    chargeEfficiency: 0.85,
    selfDischargePercentPerMonth: 5, // lead-acid 4 to 6 % (Darling)
    cutoffSocHouse: 50,
    cutoffSocStarter: 75,
    bulkAcceptanceC: 0.2,
    taperStartSoc: 80,
    temperatureCurve: LEAD_ACID_TEMPERATURE,
  },
  lifepo4: {
    peukertExponent: 1.03, // 1.02 to 1.05 (from memory)
    chargeEfficiency: 0.97, // 0.95 to 0.99 (common practice)
    selfDischargePercentPerMonth: 3, // lithium 2 to 3 % (Darling)
    cutoffSocHouse: 20, // about 80 % depth of discharge (common practice)
    cutoffSocStarter: 50, // cranking reserve (common practice)
    bulkAcceptanceC: 0.5, // charges at up to about 0.5 C (common practice)
    taperStartSoc: 95, // nearly constant current to the top (common practice)
    temperatureCurve: LIFEPO4_TEMPERATURE,
  },
};

export const MODEL_DEFAULTS = {
  /** Rated discharge time of the capacity rating (the 20-hour rate). */
  ratedHours: 20,
  inverterEfficiency: 0.9, // Home Power, "Designing a Stand-Alone PV System": about 90 %
  inverterIdleA: 0.5, // small 12 V inverters draw 0.2 to 0.8 A with no load (common practice)
  /** Below full a tapering lead-acid battery still takes this fraction of C at 100 % (from memory). */
  taperFloorC: 0.02,
  /** The disconnect trips this many points above the battery's cut-off, saving the rest for DC loads (model choice). */
  lvdPointsAboveCutoff: 10,
  lvdReconnectPoints: 10, // reconnect hysteresis (common practice)
  solarDerate: 0.75, // wiring, heat, dirt and controller losses (common practice)
  /** Daylight over which solar is spread, as a half sine (model choice). */
  daylightStartHour: 6,
  daylightEndHour: 18,
  /** Peak sun hours assumed for the solar Fix when the rig has none (common practice for a temperate summer). */
  fixPeakSunHours: 4,
  /** DC-DC chargers hold their current until nearly full (common practice). */
  dcdcTaperStartSoc: 95,
  /**
   * A voltage-sensitive relay joins at about 13.7 V and drops out below about 12.8 V (REFERENCES.md, common
   * practice): it joins once the alternator has lifted the starting battery to 13.7 V, a few minutes into
   * each drive (from memory), and drops out when the engine stops.
   */
  relayJoinMinutes: 5,
  /** A self-heating LiFePO4 battery's heater: about 50 W for about an hour from a charging source (from memory). */
  heaterW: 50,
  heaterWarmupMinutes: 60,
  /** Small 12 V inverters cut out at about 10.5 V input (common practice); scaled for 24 V and 48 V systems. */
  inverterCutoutVPer12V: 10.5,
  /** "Holds": the state at the same hour a week later falls by less than this share of the usable capacity (model choice). */
  holdsTolerance: 1e-4,
  /** Longest run, in days, for the planned stay and for the week's balance (the horizon's cap). */
  maxRunDays: 60,
  /** Margin states: short below 0 days; tight below max(1 day, 25 % of the stay) (model choice). */
  tightMarginMinDays: 1,
  tightMarginShareOfStay: 0.25,
} as const;

/** Cranking power by temperature, as [°C, share of its 27 °C value] (US Army TM 5-4210-230-14&P-1 Table 3). */
export const CRANKING_POWER_CURVE = [
  [-29, 0.2],
  [-18, 0.4],
  [0, 0.65],
  [27, 1],
] as const;

/**
 * A starting battery's cut-off (its cranking reserve) at a temperature: the depth it may be drawn below
 * full shrinks with the cranking power, so the reserve rises in the cold (model choice on TM 5-4210-230-14&P-1
 * Table 3): cut-off = 100 − (100 − warm cut-off) × cranking power. 75 % at 27 °C is 83.75 % at 0 °C, 90 % at -18 °C.
 */
export function starterCutoffSoc(warmCutoffSoc: number, temperatureC: number): number {
  return 100 - (100 - warmCutoffSoc) * temperatureFactor(CRANKING_POWER_CURVE, temperatureC);
}

/**
 * Freezing point of a lead-acid battery's electrolyte by state of charge, as [% charged, °C]: about -8 °C
 * flat and -60 °C full (REFERENCES.md, from memory); the points between are from memory too.
 */
export const LEAD_ACID_FREEZING_CURVE = [
  [0, -8],
  [25, -16],
  [50, -24],
  [75, -37],
  [100, -60],
] as const;

/** Capacity factor at a temperature: linear between the curve's points, flat beyond its ends. */
export function temperatureFactor(curve: readonly (readonly [number, number])[], temperatureC: number): number {
  const first = curve[0];
  const last = curve[curve.length - 1];
  if (temperatureC <= first[0]) return first[1];
  if (temperatureC >= last[0]) return last[1];
  for (let i = 1; i < curve.length; i++) {
    const [t1, f1] = curve[i];
    const [t0, f0] = curve[i - 1];
    if (temperatureC <= t1) return f0 + ((f1 - f0) * (temperatureC - t0)) / (t1 - t0);
  }
  return last[1];
}

/**
 * Peukert's law, t = H (C / (I H))^k: hours a battery of capacity C (rated over H hours) lasts at I amps.
 */
export function peukertHours(capacityAh: number, ratedHours: number, currentA: number, k: number): number {
  return ratedHours * Math.pow(capacityAh / (currentA * ratedHours), k);
}

/**
 * The rated amp-hours a current uses per hour: above the rated current C/H, Peukert's law makes it cost
 * more (I (I / I_rated)^(k-1)); below it no extra capacity is credited.
 */
export function peukertEffectiveCurrent(currentA: number, ratedCurrentA: number, k: number): number {
  if (currentA <= ratedCurrentA) return currentA;
  return currentA * Math.pow(currentA / ratedCurrentA, k - 1);
}
