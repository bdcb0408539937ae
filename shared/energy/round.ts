const SCALES = [1, 10, 100, 1000, 10_000, 100_000, 1_000_000];

/** x rounded to a number of decimal places (the model's figures are rounded only here, as they are reported). */
export function round(x: number, digits: number): number {
  const m = digits >= 0 && digits < SCALES.length ? SCALES[digits] : 10 ** digits;
  return Math.round(x * m) / m;
}

/** Hours as days (2 places), or null where the hours lie beyond the run's limit (nothing reached within it). */
export const toDays = (hours: number | null, limitHours: number) => (hours === null || hours > limitHours + 1e-9 ? null : round(hours / 24, 2));
