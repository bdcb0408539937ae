/**
 * Energy in the person's unit. The model works in amp-hours at the battery; watt-hours are those
 * amp-hours times the rig's nominal system voltage (energy = charge × voltage), the one conversion the
 * app's screens and the server's e-mails share.
 */
export type EnergyUnit = 'Ah' | 'Wh';
export const ENERGY_UNITS = ['Ah', 'Wh'] as const satisfies readonly EnergyUnit[];
export const DEFAULT_ENERGY_UNIT: EnergyUnit = 'Ah';

/** Watt-hours of so many amp-hours at the rig's nominal voltage. */
export const whOf = (ah: number, systemVoltage: number) => ah * systemVoltage;

/** The number alone, for a column headed by its unit: "12.5", or whole watt-hours at the system voltage ("150"). */
export function energyAmount(ah: number, energy: EnergyUnit, systemVoltage = 12, digits = 1): string {
  return energy === 'Wh' ? whOf(ah, systemVoltage).toFixed(0) : ah.toFixed(digits);
}

/** Amp-hours as the person likes them: "12.5 Ah", or whole watt-hours at the system voltage ("150 Wh"). */
export function formatEnergy(ah: number, energy: EnergyUnit, systemVoltage = 12, digits = 1): string {
  return `${energyAmount(ah, energy, systemVoltage, digits)} ${energy}`;
}

/**
 * A server text (a warning, a Fix, a line of an e-mail) in the person's energy unit. The model states
 * energy as "<number> Ah" in every text it writes, whatever the wording around it; with Wh chosen each
 * such figure becomes whole watt-hours at the system voltage, so reworded texts keep following the setting.
 */
export function energyInText(text: string, energy: EnergyUnit, systemVoltage = 12): string {
  if (energy === 'Ah') return text;
  return text.replace(/(\d[\d,]*(?:\.\d+)?)\s?Ah\b/g, (_m, n: string) => `${Math.round(whOf(Number(n.replaceAll(',', '')), systemVoltage)).toLocaleString('en-US')} Wh`);
}
