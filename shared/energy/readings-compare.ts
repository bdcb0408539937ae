// The measured drain held against the model's over the same quiet hours, honestly: a figure only with
// enough quiet hours, and a rough estimate compared by its range. Pure functions.
import { READING_RULES, type ReadingsAnalysis, twoFigures } from './readings';

const H = 3_600_000;

export const STANDBY_CAUSES = [
  'a device left on: a light, a USB charger, a dash camera, a fridge running',
  'the inverter powered when it should be off',
  "the vehicle's own modules not going to sleep (alarm, radio, a door or boot light)",
  'a relay, DC-DC charger or battery monitor that draws while idle',
  'an ageing battery with a high self-discharge, or a failing cell',
];

export type ModelComparison = {
  enough: boolean;
  quietHours: number;
  neededHours: number;
  measuredA: number;
  modelA: number | null;
  differencePercent: number | null;
  matches: boolean | null;
  message: string;
  causes: string[];
  /** The key-off draw that would make the model agree (two figures), when the measured drain is clearly higher. */
  suggestedKeyOffDrawA: number | null;
};

/**
 * The measured drain held against the model's drain over the same quiet hours (`modelAmpsAt` gives the
 * model's parked battery current in the hour that starts at a time, or null outside the model's run).
 * "Matches within N %" only once there are enough quiet hours; a rough estimate matches when the model's
 * figure lies inside its range.
 */
export function compareWithModel(a: ReadingsAnalysis, modelAmpsAt: (hourStartMs: number) => number | null, keyOffDrawA: number): ModelComparison | null {
  if (a.drainA === null) return null;
  let hours = 0;
  let ah = 0;
  for (const s of a.spans) {
    let t = Date.parse(s.from);
    const end = t + s.hours * H;
    while (t < end - 1) {
      const hourStart = Math.floor(t / H) * H;
      const next = Math.min(end, hourStart + H);
      const amps = modelAmpsAt(hourStart);
      if (amps !== null) {
        hours += (next - t) / H;
        ah += amps * ((next - t) / H);
      }
      t = next;
    }
  }
  const needed = READING_RULES.quietHoursNeeded;
  const quietHours = Math.round(hours * 10) / 10;
  const base = { quietHours, neededHours: needed, measuredA: a.drainA, causes: [] as string[], suggestedKeyOffDrawA: null };
  if (hours < needed) {
    return { ...base, enough: false, modelA: hours > 0 ? twoFigures(ah / hours) : null, differencePercent: null, matches: null, message: `Not enough quiet hours yet to hold the readings against the model: ${quietHours} of ${needed}; ${Math.ceil(needed - hours)} more needed.` };
  }
  const modelA = ah / hours;
  const shown = twoFigures(modelA);
  if (a.rangeA) {
    const inside = modelA >= a.rangeA[0] && modelA <= a.rangeA[1];
    return { ...base, enough: true, modelA: shown, differencePercent: null, matches: inside, message: inside ? `The model's ${shown} A lies within the rough estimate (${a.rangeA[0]} to ${a.rangeA[1]} A); measure the current to tell them apart.` : `The model's ${shown} A lies outside the rough estimate (${a.rangeA[0]} to ${a.rangeA[1]} A); measure the current to be sure.` };
  }
  const diff = a.drainA - modelA;
  const pct = modelA > 0 ? Math.round((Math.abs(diff) / modelA) * 100) : null;
  const matches = pct !== null ? pct <= READING_RULES.matchPercent : Math.abs(diff) < 0.02;
  const message = matches
    ? `Matches the model within ${pct ?? 0} % over ${quietHours} quiet hours: ${a.drainA} A measured, ${shown} A modelled.`
    : diff > 0
      ? `${twoFigures(diff)} A more than the model over ${quietHours} quiet hours: ${a.drainA} A measured against ${shown} A modelled.`
      : `The model expects ${twoFigures(-diff)} A more than measured over ${quietHours} quiet hours (${shown} A against ${a.drainA} A): a load or the key-off draw entered may be too high.`;
  return { ...base, enough: true, modelA: shown, differencePercent: pct, matches, message, causes: !matches && diff > 0 ? STANDBY_CAUSES : [], suggestedKeyOffDrawA: !matches && diff > 0 ? twoFigures(keyOffDrawA + diff) : null };
}
