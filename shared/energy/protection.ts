/** Protection: the standard fuse and breaker ratings, and the least and most a conductor's device may be. */

// NEC 240.6(A) standard ratings, its additional fuse ratings, and the blade fuse series in common use
// (ISO 8820-3 series: common practice; the 1 A value from memory).
export const NEC_RATINGS = [15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500];
export const NEC_FUSE_ONLY = [1, 3, 6, 10];
export const BLADE_FUSES = [1, 2, 3, 4, 5, 7.5, 10, 15, 20, 25, 30, 35, 40];
export const STANDARD_RATINGS = [...new Set([...NEC_RATINGS, ...NEC_FUSE_ONLY, ...BLADE_FUSES])].sort((a, b) => a - b);

/** NEC 210.20(A): the device carries at least the non-continuous load plus 125 % of the continuous load. */
export function minimumProtectionA(currentA: number, continuous: boolean): number {
  return continuous ? currentA * 1.25 : currentA;
}

/** 33 CFR 183.455: under 50 V the rating may be up to 150 % of the conductor's Table 5 amps; else 100 %. */
export function maximumProtectionA(ampacityA: number, systemVoltage: number): number {
  return systemVoltage < 50 ? ampacityA * 1.5 : ampacityA;
}

/**
 * What a fuse of this rating is: the ISO 8820-3 blade series has no 6 A (NEC 240.6(A)'s 6 A is a cartridge
 * fuse), and above 40 A fuses bolt down.
 */
export function fuseKindOf(ratingA: number): string {
  if (BLADE_FUSES.includes(ratingA)) return 'Blade fuse (ISO 8820-3 series) or circuit breaker';
  if (ratingA < 40) return `Cartridge fuse (NEC 240.6(A) rating; no ${ratingA} A blade in the ISO 8820-3 series) or circuit breaker`;
  return 'Bolt-down high-current fuse or circuit breaker';
}

/** The smallest standard rating in [min, max], or null. */
export function standardRating(minA: number, maxA: number): number | null {
  return STANDARD_RATINGS.find((r) => r >= minA - 1e-9 && r <= maxA + 1e-9) ?? null;
}
