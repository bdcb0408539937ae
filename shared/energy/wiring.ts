import type { CableRunSizeInput } from '../schemas/cable-run';
import { BREAKER_ADVICE, CABLE_CAUTIONS, chassisReturnCaution } from '../safety';
import {
  AWG_SIZES,
  type Awg,
  awgAmpacity,
  awgOhmPerM,
  CHASSIS_GROUND_ALLOWANCE_OHM,
  type InsulationC,
  MM2_SIZES,
  mm2Ampacity,
  mm2OhmPerM,
} from './conductors';
import { MODEL_DEFAULTS } from './defaults';
import { fuseKindOf, maximumProtectionA, minimumProtectionA, standardRating } from './protection';

// Sizing a cable run: the smallest conductor whose voltage drop stays within the limit and whose ampacity
// carries the current (conductors.ts), then the smallest standard fuse or breaker between the load's need and
// the conductor's limit (protection.ts). Pure functions; every table names its source. The tables are
// re-exported for the callers that size runs from here.
export * from './conductors';
export * from './protection';

export type SizeCheck = { dropV: number; dropPercent: number; ampacityA: number; meetsDrop: boolean; carries: boolean };

export type CableRunResult = {
  /** The current the run is sized for, and where it came from. */
  currentA: number;
  basis: null | { inverterW: number; cutoutV: number; efficiencyPercent: number; continuous: true };
  awg: Awg;
  mm2: number;
  dropV: number;
  dropPercent: number;
  ampacityA: number;
  fuseA: number;
  fuseKind: string;
  breaker: { type: string; standard: string; advice: string };
  protection: { minimumA: number; maximumA: number; placement: string };
  conductorLengthM: number;
  nextSmaller: null | { awg: Awg; dropV: number; dropPercent: number; ampacityA: number; fails: ('drop' | 'ampacity' | 'protection')[] };
  metric: { mm2: number; dropV: number; dropPercent: number; ampacityA: number; fuseA: number };
  metricNextSmaller: null | { mm2: number; dropV: number; dropPercent: number; ampacityA: number; fails: ('drop' | 'ampacity' | 'protection')[] };
  cautions: string[];
};

export class NoConductorError extends Error {
  constructor(readonly currentA: number) {
    super(`No conductor in the table (up to 4/0 AWG and 95 mm²) carries ${currentA} A within the limits: split the load over parallel runs or shorten the run.`);
  }
}

const r3 = (x: number) => Math.round(x * 1000) / 1000;

/**
 * The current an inverter's feed is sized for: its rated watts at its low-voltage cut-out (about 10.5 V on
 * 12 V, common practice; in proportion on 24 and 48 V) through its efficiency. The feed carries it
 * continuously (NEC 210.20(A)).
 */
export function inverterFeedCurrentA(ratedW: number, systemVoltage: number, efficiencyPercent: number): number {
  const cutoutV = (MODEL_DEFAULTS.inverterCutoutVPer12V * systemVoltage) / 12;
  return ratedW / (cutoutV * (efficiencyPercent / 100));
}

export function sizeCableRun(input: CableRunSizeInput): CableRunResult {
  const { systemVoltage: V, lengthM, maxDropPercent, engineSpace, returnPath } = input;
  const fromInverter = input.inverterW !== undefined;
  const I = fromInverter ? inverterFeedCurrentA(input.inverterW!, V, input.inverterEfficiencyPercent) : input.currentA!;
  // An inverter's feed is a continuous load (NEC 210.20(A)).
  const continuous = fromInverter || input.continuous;
  const insulationC = input.insulationC as InsulationC;
  const T = input.conductorTemperatureC;
  const conductorLengthM = returnPath === 'cable' ? 2 * lengthM : lengthM;
  const groundOhm = returnPath === 'chassis' ? CHASSIS_GROUND_ALLOWANCE_OHM : 0;
  const maxDropV = (V * maxDropPercent) / 100;
  const minProtection = minimumProtectionA(I, continuous);

  const check = (ohmPerM: number, ampacityA: number): SizeCheck & { fuseA: number | null } => {
    const dropV = I * (ohmPerM * conductorLengthM + groundOhm);
    const fuseA = standardRating(minProtection, maximumProtectionA(ampacityA, V));
    return { dropV, dropPercent: (dropV / V) * 100, ampacityA, meetsDrop: dropV <= maxDropV + 1e-12, carries: ampacityA >= I, fuseA };
  };
  const fails = (c: ReturnType<typeof check>) =>
    [!c.meetsDrop && 'drop', !c.carries && 'ampacity', c.fuseA === null && 'protection'].filter(Boolean) as ('drop' | 'ampacity' | 'protection')[];

  const awgChecks = AWG_SIZES.map((a) => check(awgOhmPerM(a, T), awgAmpacity(a, insulationC, engineSpace)));
  const ai = awgChecks.findIndex((c) => c.meetsDrop && c.carries && c.fuseA !== null);
  const mmChecks = MM2_SIZES.map((m) => check(mm2OhmPerM(m, T), mm2Ampacity(m, insulationC, engineSpace)));
  const mi = mmChecks.findIndex((c) => c.meetsDrop && c.carries && c.fuseA !== null);
  if (ai < 0 || mi < 0) throw new NoConductorError(I);

  const a = awgChecks[ai];
  const m = mmChecks[mi];
  const fuseA = a.fuseA!;
  const inverter = input.purpose === 'inverter';
  const cautions = [...CABLE_CAUTIONS];
  if (returnPath === 'chassis') {
    cautions.unshift(chassisReturnCaution(CHASSIS_GROUND_ALLOWANCE_OHM * 1000));
  }
  return {
    currentA: r3(I),
    basis: fromInverter
      ? { inverterW: input.inverterW!, cutoutV: (MODEL_DEFAULTS.inverterCutoutVPer12V * V) / 12, efficiencyPercent: input.inverterEfficiencyPercent, continuous: true }
      : null,
    awg: AWG_SIZES[ai],
    mm2: MM2_SIZES[mi],
    dropV: r3(a.dropV),
    dropPercent: r3(a.dropPercent),
    ampacityA: r3(a.ampacityA),
    fuseA,
    fuseKind: fuseKindOf(fuseA),
    breaker: {
      type: 'type III, manual reset, trip-free',
      standard: 'SAE J553',
      advice: inverter ? BREAKER_ADVICE.inverter : BREAKER_ADVICE.general,
    },
    protection: {
      minimumA: r3(minProtection),
      maximumA: r3(maximumProtectionA(a.ampacityA, V)),
      placement: 'At the source (the battery positive), within 7 in (178 mm), or 40 in (1 m) if the conductor is sheathed (33 CFR 183.455).',
    },
    conductorLengthM: r3(conductorLengthM),
    nextSmaller:
      ai > 0
        ? { awg: AWG_SIZES[ai - 1], dropV: r3(awgChecks[ai - 1].dropV), dropPercent: r3(awgChecks[ai - 1].dropPercent), ampacityA: r3(awgChecks[ai - 1].ampacityA), fails: fails(awgChecks[ai - 1]) }
        : null,
    metric: { mm2: MM2_SIZES[mi], dropV: r3(m.dropV), dropPercent: r3(m.dropPercent), ampacityA: r3(m.ampacityA), fuseA: m.fuseA! },
    metricNextSmaller:
      mi > 0
        ? { mm2: MM2_SIZES[mi - 1], dropV: r3(mmChecks[mi - 1].dropV), dropPercent: r3(mmChecks[mi - 1].dropPercent), ampacityA: r3(mmChecks[mi - 1].ampacityA), fails: fails(mmChecks[mi - 1]) }
        : null,
    cautions,
  };
}

/** A warning for each fitted wire smaller than the size the run needs (a saved run's, or one typed into Wire a circuit). */
export function fittedWireWarnings(sizing: Pick<CableRunResult, 'awg' | 'mm2'>, existingAwg?: string | null, existingMm2?: number | null): string[] {
  const warnings: string[] = [];
  if (existingAwg && AWG_SIZES.indexOf(existingAwg as Awg) < AWG_SIZES.indexOf(sizing.awg)) {
    warnings.push(`The fitted ${existingAwg} AWG is smaller than the ${sizing.awg} AWG this run needs.`);
  }
  if (existingMm2 && MM2_SIZES.indexOf(existingMm2 as (typeof MM2_SIZES)[number]) < MM2_SIZES.indexOf(sizing.mm2 as (typeof MM2_SIZES)[number])) {
    warnings.push(`The fitted ${existingMm2} mm² is smaller than the ${sizing.mm2} mm² this run needs.`);
  }
  return warnings;
}
