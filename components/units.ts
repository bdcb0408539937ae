import { useSyncExternalStore } from 'react';

/** The reader's units: kept on this device (localStorage on the web). */
export type Units = { power: 'W' | 'A'; energy: 'Ah' | 'Wh'; temperature: 'C' | 'F'; wire: 'AWG' | 'mm2' };
export const DEFAULT_UNITS: Units = { power: 'W', energy: 'Ah', temperature: 'C', wire: 'AWG' };
const KEY = 'keyoff.units';

function read(): Units {
  try {
    const raw = typeof localStorage !== 'undefined' ? localStorage.getItem(KEY) : null;
    return raw ? { ...DEFAULT_UNITS, ...JSON.parse(raw) } : DEFAULT_UNITS;
  } catch {
    return DEFAULT_UNITS;
  }
}

let current: Units | null = null;
const listeners = new Set<() => void>();
const subscribe = (listener: () => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};
const snapshot = () => (current ??= read());
// The static page renders with the defaults, so hydration matches; the saved choice applies right after.
const serverSnapshot = () => DEFAULT_UNITS;

function setUnits(units: Units) {
  current = units;
  try {
    localStorage.setItem(KEY, JSON.stringify(units));
  } catch {
    // private mode: the choice lasts for this visit
  }
  listeners.forEach((l) => l());
}

export function useUnits() {
  return { units: useSyncExternalStore(subscribe, snapshot, serverSnapshot), setUnits };
}

/** Amp-hours as the reader likes them: Ah, or Wh at the system voltage. */
export function formatEnergy(ah: number, units: Units, systemVoltage = 12, digits = 1): string {
  return units.energy === 'Wh' ? `${(ah * systemVoltage).toFixed(0)} Wh` : `${ah.toFixed(digits)} Ah`;
}

/** A device's draw as W or as A at the battery. */
export function formatPower(watts: number, amps: number, units: Units): string {
  return units.power === 'A' ? `${amps.toFixed(1)} A` : `${Math.round(watts * 10) / 10} W`;
}

export const cToF = (c: number) => Math.round((c * 9) / 5 + 32);
export const fToC = (f: number) => Math.round(((f - 32) * 5) / 9 * 10) / 10;

/**
 * A server text (a warning, a Fix) in the reader's energy unit. The model states energy as "<number> Ah"
 * in every text it writes, whatever the wording around it; with Wh chosen each such figure is shown in
 * watt-hours at the system voltage, so reworded texts keep following the setting.
 */
export function energyInText(text: string, units: Units, systemVoltage = 12): string {
  if (units.energy === 'Ah') return text;
  return text.replace(/(\d[\d,]*(?:\.\d+)?)\s?Ah\b/g, (_m, n: string) => `${Math.round(Number(n.replaceAll(',', '')) * systemVoltage).toLocaleString('en-US')} Wh`);
}
