import { minimumProtectionA, STANDARD_RATINGS } from '../protection';

/**
 * The inverter feed's figures from the inverter's own: the current it draws at full output near its
 * low-voltage cut-out, counted as a continuous load. Pure; each figure names its source.
 */

// Small 12 V inverters cut out at about 10.5 V input (REFERENCES, common practice). Other system voltages
// scale it by V / 12 (model choice: 21 V on a 24 V system).
export const CUT_OUT_V_PER_12V = 10.5;

export const cutOutVoltage = (systemVoltage: number) => (CUT_OUT_V_PER_12V * systemVoltage) / 12;

/** DC input current = AC output watts / (DC volts × efficiency) (Home Power, as in REFERENCES), at the cut-out. */
export function feedCurrentA(ratedW: number, efficiencyPercent: number, systemVoltage: number): number {
  return ratedW / (cutOutVoltage(systemVoltage) * (efficiencyPercent / 100));
}

/** An inverter can run at full output for hours: a continuous load, so 125 % (NEC 210.20(A)). */
export const continuousFeedA = (currentA: number) => minimumProtectionA(currentA, true);

/** The smallest standard rating at or above a current (NEC 240.6(A) and the blade series), or null above the table. */
export const ratingAtLeast = (minA: number) => STANDARD_RATINGS.find((r) => r >= minA - 1e-9) ?? null;

// Common automotive relays (ISO 280/mini) carry 30 or 40 A on their contacts (REFERENCES, common practice).
export const ISO_RELAY_CONTACTS_A = [30, 40] as const;

// Coil currents (from memory): an ISO mini relay's coil is about 80 to 90 ohms at 12 V, about 0.15 A;
// a continuous-duty solenoid's pull-in coil about 1 A. Both scale with the system voltage's coil.
export const RELAY_COIL_A = 0.15;
export const SOLENOID_COIL_A = 1;

/** The coil's own fuse: the smallest blade fuse at or above 125 % of the coil current (model choice). */
export const coilFuseA = (coilA: number) => ratingAtLeast(coilA * 1.25) ?? 1;

// A switch, relay or disconnect in the feed is rated at least as high as the fuse ahead of it, so the fuse,
// not the contacts, is the weak link (common practice).
export const switchRatingFor = (fuseA: number) => fuseA;

// SAE J553 breaker types, as REFERENCES gives them.
export const SAE_J553 = {
  typeI: 'SAE J553 type I (automatic reset): cycles open and closed while the fault lasts.',
  typeII: 'SAE J553 type II (modified reset): stays open while powered, resets when power is removed.',
  typeIII: 'SAE J553 type III (manual reset, trip-free): stays open until reset by hand and cannot be held closed against a fault.',
};
