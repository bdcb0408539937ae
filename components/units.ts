import { useSyncExternalStore } from 'react';

import { type EnergyUnit, DEFAULT_ENERGY_UNIT, energyInText as energyInUnit, formatEnergy as formatEnergyIn } from '@/shared/units';

/**
 * The reader's units: kept on this device (localStorage on the web). The energy unit is also kept on the
 * account when signed in (the e-mails use it): the session takes it from there.
 */
export type Units = { power: 'W' | 'A'; energy: EnergyUnit; temperature: 'C' | 'F'; wire: 'AWG' | 'mm2' };
export const DEFAULT_UNITS: Units = { power: 'W', energy: DEFAULT_ENERGY_UNIT, temperature: 'C', wire: 'AWG' };
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

export function setUnits(units: Units) {
  current = units;
  try {
    localStorage.setItem(KEY, JSON.stringify(units));
  } catch {
    // private mode: the choice lasts for this visit
  }
  listeners.forEach((l) => l());
}

/** The units on this device now, outside React. */
export const currentUnits = () => snapshot();

export function useUnits() {
  return { units: useSyncExternalStore(subscribe, snapshot, serverSnapshot), setUnits };
}

/** Amp-hours as the reader likes them: Ah, or Wh at the system voltage (shared/units.ts). */
export function formatEnergy(ah: number, units: Units, systemVoltage = 12, digits = 1): string {
  return formatEnergyIn(ah, units.energy, systemVoltage, digits);
}

/** A device's draw as W or as A at the battery. */
export function formatPower(watts: number, amps: number, units: Units): string {
  return units.power === 'A' ? `${amps.toFixed(1)} A` : `${Math.round(watts * 10) / 10} W`;
}

export const cToF = (c: number) => Math.round((c * 9) / 5 + 32);
export const fToC = (f: number) => Math.round(((f - 32) * 5) / 9 * 10) / 10;

/** A server text (a warning, a Fix) in the reader's energy unit: the one conversion in shared/units.ts. */
export function energyInText(text: string, units: Units, systemVoltage = 12): string {
  return energyInUnit(text, units.energy, systemVoltage);
}
