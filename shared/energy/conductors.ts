/**
 * Conductors: copper sizes, their resistance and their ampacity, each table with its source (for sizing a
 * cable run in wiring.ts).
 */

// NEC (NFPA 70) Chapter 9, Table 8: uncoated stranded copper at 75 °C, ohms per 1000 ft.
// 3/0 (0.0766) is not in REFERENCES.md: from memory of the same table.
export const AWG_SIZES = ['18', '16', '14', '12', '10', '8', '6', '4', '2', '1', '1/0', '2/0', '3/0', '4/0'] as const;
export type Awg = (typeof AWG_SIZES)[number];

export const NEC_TABLE8_OHM_PER_KFT_75C: Record<Awg, number> = {
  '18': 7.95,
  '16': 4.99,
  '14': 3.14,
  '12': 1.98,
  '10': 1.24,
  '8': 0.778,
  '6': 0.491,
  '4': 0.308,
  '2': 0.194,
  '1': 0.154,
  '1/0': 0.122,
  '2/0': 0.0967,
  '3/0': 0.0766,
  '4/0': 0.0608,
};

/** The gauge number n of ASTM B258 (0000 is n = -3). */
export function awgNumber(awg: Awg): number {
  return awg.endsWith('/0') ? 1 - Number(awg[0]) : Number(awg);
}

/** ASTM B258: d = 0.127 mm × 92^((36 − n) / 39). */
export function awgDiameterMm(awg: Awg): number {
  return 0.127 * Math.pow(92, (36 - awgNumber(awg)) / 39);
}

export function awgAreaMm2(awg: Awg): number {
  const d = awgDiameterMm(awg);
  return (Math.PI * d * d) / 4;
}

// IACS copper: 1.7241e-8 ohm m at 20 °C, 0.00393 per °C (IEC 60028; IEC 60287-1-1 Table 1).
export const IACS_RESISTIVITY_20C = 1.7241e-8;
export const COPPER_ALPHA_20C = 0.00393;
// NEC Chapter 9, Table 8 note: R2 = R1 (1 + 0.00323 (T2 − 75)).
export const NEC_ALPHA_75C = 0.00323;

/** Resistance of a solid round conductor of IACS copper from its area, ohms per metre. */
export function iacsOhmPerM(areaMm2: number, temperatureC = 20): number {
  return (IACS_RESISTIVITY_20C / (areaMm2 * 1e-6)) * (1 + COPPER_ALPHA_20C * (temperatureC - 20));
}

/** Stranded AWG resistance, ohms per metre, from NEC Table 8 at 75 °C moved to the temperature by its note. */
export function awgOhmPerM(awg: Awg, temperatureC = 75): number {
  return (NEC_TABLE8_OHM_PER_KFT_75C[awg] / 304.8) * (1 + NEC_ALPHA_75C * (temperatureC - 75));
}

// IEC 60228, class 5 (flexible) plain copper, maximum ohm/km at 20 °C. Vehicle cable is flexible.
// 70 and 95 mm² (0.272, 0.206) are not in REFERENCES.md: from memory of the same table.
export const MM2_SIZES = [1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95] as const;
export const IEC60228_CLASS5_OHM_PER_KM_20C: Record<number, number> = {
  1.5: 13.3,
  2.5: 7.98,
  4: 4.95,
  6: 3.3,
  10: 1.91,
  16: 1.21,
  25: 0.78,
  35: 0.554,
  50: 0.386,
  70: 0.272,
  95: 0.206,
};
// Class 2 (stranded), for checks against the standard.
export const IEC60228_CLASS2_OHM_PER_KM_20C: Record<number, number> = {
  1.5: 12.1,
  2.5: 7.41,
  4: 4.61,
  6: 3.08,
  10: 1.83,
  16: 1.15,
  25: 0.727,
  35: 0.524,
  50: 0.387,
};

/** IEC 60228's correction to 20 °C is k = 254.5 / (234.5 + t); its inverse moves a 20 °C value to t. */
export function mm2OhmPerM(mm2: number, temperatureC = 75): number {
  return (IEC60228_CLASS5_OHM_PER_KM_20C[mm2] / 1000) * ((234.5 + temperatureC) / 254.5);
}

// 33 CFR 183.425 Table 5 (wire outside engine spaces), amps by insulation rating.
// 18, 1, 1/0, 2/0 and 3/0 AWG are not in REFERENCES.md: from memory of the same table.
export const INSULATION_RATINGS = [60, 75, 80, 90, 105, 125, 200] as const;
export type InsulationC = (typeof INSULATION_RATINGS)[number];
export const CFR_TABLE5_AMPS: Record<Awg, readonly number[]> = {
  '18': [10, 10, 15, 20, 20, 25, 25],
  '16': [15, 15, 20, 25, 25, 30, 35],
  '14': [20, 20, 25, 30, 35, 40, 45],
  '12': [25, 25, 35, 40, 45, 50, 55],
  '10': [40, 40, 50, 55, 60, 70, 70],
  '8': [55, 65, 70, 70, 80, 90, 100],
  '6': [80, 95, 100, 100, 120, 125, 135],
  '4': [105, 125, 130, 135, 160, 170, 180],
  '2': [140, 170, 175, 180, 210, 225, 240],
  '1': [165, 195, 210, 210, 245, 265, 280],
  '1/0': [195, 230, 245, 245, 285, 305, 325],
  '2/0': [225, 265, 285, 285, 330, 355, 370],
  '3/0': [260, 310, 330, 330, 385, 410, 430],
  '4/0': [300, 360, 385, 385, 445, 475, 510],
};
// 33 CFR 183.425: inside an engine space the amps are multiplied by a factor per insulation rating.
// 0.85 for 105 °C is in REFERENCES.md; the others are from memory of the same table.
export const ENGINE_SPACE_FACTOR: Record<InsulationC, number> = { 60: 0.58, 75: 0.75, 80: 0.75, 90: 0.82, 105: 0.85, 125: 0.89, 200: 1 };

export function awgAmpacity(awg: Awg, insulationC: InsulationC, engineSpace: boolean): number {
  const amps = CFR_TABLE5_AMPS[awg][INSULATION_RATINGS.indexOf(insulationC)];
  return engineSpace ? amps * ENGINE_SPACE_FACTOR[insulationC] : amps;
}

/** A metric conductor's ampacity: Table 5 interpolated on cross-section, log-log, between AWG sizes (model choice). */
export function mm2Ampacity(mm2: number, insulationC: InsulationC, engineSpace: boolean): number {
  const points = AWG_SIZES.map((a) => [Math.log(awgAreaMm2(a)), Math.log(awgAmpacity(a, insulationC, engineSpace))] as const);
  const x = Math.log(mm2);
  let i = 1;
  while (i < points.length - 1 && points[i][0] < x) i++;
  const [x0, y0] = points[i - 1];
  const [x1, y1] = points[i];
  return Math.exp(y0 + ((y1 - y0) * (x - x0)) / (x1 - x0));
}

// SAE J1127/J1128 conductor areas in circular mils, as reproduced in marine wiring catalogues.
export const SAE_CIRCULAR_MILS: Partial<Record<Awg, number>> = {
  '18': 1537,
  '16': 2336,
  '14': 3702,
  '12': 5833,
  '10': 9343,
  '8': 14810,
  '6': 24538,
  '4': 37360,
  '2': 62450,
  '1/0': 98980,
  '4/0': 205500,
};

/** ABYC E-11's sizing relation CM = K × I × L / E, K = 10.75 (from memory; it reproduces ABYC's 12 V 3 % table). */
export function abycCircularMils(currentA: number, roundTripFt: number, dropV: number): number {
  return (10.75 * currentA * roundTripFt) / dropV;
}

/** The smallest SAE size whose area reaches a number of circular mils. */
export function saeSizeFor(circularMils: number): Awg | null {
  return AWG_SIZES.find((a) => (SAE_CIRCULAR_MILS[a] ?? 0) >= circularMils) ?? null;
}

/** The chassis path and its joints, counted as this many ohms when the return runs through the body (model choice). */
export const CHASSIS_GROUND_ALLOWANCE_OHM = 0.001;
