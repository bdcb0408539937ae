import type { HookupInput } from '../../schemas/hookup';
import { cableRunSizeSchema } from '../../schemas/cable-run';
import type { InverterConnection, InverterControl } from '../../schemas/projection';
import { HOOKUP_CAUTIONS, MAKER_FIRST, WHY_NOT_TYPE_I } from '../../safety';
import { CHEMISTRY_DEFAULTS, MODEL_DEFAULTS } from '../defaults';
import { type Awg, CHASSIS_GROUND_ALLOWANCE_OHM, NoConductorError, sizeCableRun } from '../wiring';
import { continuousFeedA, cutOutVoltage, feedCurrentA, ratingAtLeast, SAE_J553 } from './feed';
import { socketPlanWarnings } from './socket';
import { controlParts } from './switching';
import type { HookupPart, HookupWarning } from './parts';

export type { HookupPart, HookupPartKind, HookupWarning } from './parts';

/**
 * The inverter's hook-up: every part from battery to inverter and back, each rated from the inverter's
 * own figures. Pure: the same plan for POST /api/hookups, a saved rig, and a rig as a Fix would change it.
 */

export type HookupPlan = {
  control: InverterControl;
  connection: InverterConnection;
  feed: {
    /** At full output near the cut-out. */
    currentA: number;
    /** 125 % of it: what protection and contacts must carry (NEC 210.20(A)). */
    continuousA: number;
    awg: Awg | null;
    mm2: number | null;
    fuseA: number | null;
    dropPercent: number | null;
    lengthM: number;
    returnPath: 'cable' | 'chassis' | 'vehicle';
    cutOutV: number;
  };
  parts: HookupPart[];
  warnings: HookupWarning[];
  cautions: string[];
};

const r1 = (x: number) => Math.round(x * 10) / 10;
const r2 = (x: number) => Math.round(x * 100) / 100;

export function planHookup(input: HookupInput): HookupPlan {
  const inv = input.inverter;
  if (!inv) throw new Error('A hook-up plan needs an inverter.');
  const V = input.systemVoltage;
  const currentA = feedCurrentA(inv.ratedW, inv.efficiencyPercent, V);
  const continuousA = continuousFeedA(currentA);
  const b = input.battery;
  const battery: HookupPart = {
    kind: 'battery',
    label: `${b.capacityAh} Ah ${b.chemistry === 'lifepo4' ? 'LiFePO4' : b.chemistry.toUpperCase()} ${b.role === 'starter' ? 'starting' : 'house'} battery`,
    ratingA: null,
    notes: [`${V} V system.`],
  };
  const inverter: HookupPart = {
    kind: 'inverter',
    label: `${inv.ratedW} W inverter`,
    ratingA: r1(currentA),
    notes: [
      `Draws up to ${r1(currentA)} A at full output near its ${r1(cutOutVoltage(V))} V cut-out: ${inv.ratedW} W / (${r1(cutOutVoltage(V))} V × ${inv.efficiencyPercent} %).`,
      `Idle draw ${inv.idleA} A whenever it is powered.`,
    ],
  };
  const cautions = [MAKER_FIRST, ...HOOKUP_CAUTIONS];

  if (inv.connection === 'socket') {
    return {
      control: inv.control,
      connection: 'socket',
      feed: { currentA: r2(currentA), continuousA: r2(continuousA), awg: null, mm2: null, fuseA: inv.socketFuseA, dropPercent: null, lengthM: input.feedLengthM, returnPath: 'vehicle', cutOutV: cutOutVoltage(V) },
      parts: [
        battery,
        {
          kind: 'protection',
          label: `${inv.socketFuseA} A socket fuse (vehicle fuse box)`,
          ratingA: inv.socketFuseA,
          notes: ['The vehicle maker\'s fuse for the socket circuit. Never fit a bigger one: the wiring behind the socket is sized for it.'],
        },
        {
          kind: 'socket',
          label: `Accessory socket, ${inv.socketSwitched ? 'live with the ignition' : 'always live'}`,
          ratingA: inv.socketFuseA,
          notes: [
            'SAE J563 sockets are fused at 10, 15 or 20 A; about 120 to 150 W suits a plug-in inverter (common practice).',
            inv.socketSwitched ? 'Off with the key: the inverter cannot drain the battery while parked.' : 'Live with the key out: the inverter\'s idle draw continues while parked.',
          ],
        },
        { kind: 'conductor', label: 'Vehicle wiring to the socket', ratingA: inv.socketFuseA, notes: ['Sized by the vehicle maker for the socket\'s fuse.'] },
        inverter,
        { kind: 'return', label: 'Socket\'s outer contact and the body', ratingA: null, notes: ['The vehicle\'s own return path.'] },
      ],
      warnings: socketPlanWarnings(input),
      cautions,
    };
  }

  let sized: ReturnType<typeof sizeCableRun> | null = null;
  const warnings: HookupWarning[] = [];
  const sizeInput = cableRunSizeSchema.safeParse({
    systemVoltage: V,
    currentA,
    lengthM: input.feedLengthM,
    maxDropPercent: 3,
    insulationC: input.insulationC,
    engineSpace: input.engineSpace,
    returnPath: input.returnPath,
    continuous: true,
    purpose: 'inverter',
  });
  try {
    if (!sizeInput.success) throw new NoConductorError(r1(currentA));
    sized = sizeCableRun(sizeInput.data);
  } catch (err) {
    if (!(err instanceof NoConductorError)) throw err;
    warnings.push({ code: 'feed-too-heavy', message: `${err.message} For an inverter this size a higher system voltage is the usual answer.` });
  }
  const fuseA = sized?.fuseA ?? ratingAtLeast(continuousA);
  const placement = 'At the battery positive, within 7 in (178 mm) of the terminal, or 40 in (1 m) if the cable is sheathed (33 CFR 183.455).';
  const switchingBreaker = inv.control === 'manual-switch' && input.switchAt === 'battery';
  const protection: HookupPart = switchingBreaker
    ? {
        kind: 'switching-breaker',
        label: `${fuseA ?? '?'} A switching breaker, SAE J553 type III`,
        ratingA: fuseA,
        notes: [SAE_J553.typeIII, 'Protection and cut-off switch in one: switch the inverter off here.', placement, WHY_NOT_TYPE_I],
      }
    : {
        kind: 'protection',
        label: `${fuseA ?? '?'} A ${sized && fuseA !== null && fuseA <= 40 ? 'fuse' : 'fuse or breaker'} at the battery`,
        ratingA: fuseA,
        notes: [
          sized ? `${sized.fuseKind}; a breaker here is manual-reset, trip-free (SAE J553 type III).` : 'A manual-reset, trip-free breaker (SAE J553 type III) or a fuse.',
          `At least ${r1(continuousA)} A: 125 % of the ${r1(currentA)} A feed, a continuous load (NEC 210.20(A)); at most 150 % of the cable's rating (33 CFR 183.455).`,
          placement,
          WHY_NOT_TYPE_I,
        ],
      };
  const lvdSoc = inv.lvdSocPercent ?? defaultLvdSoc(input);
  const control = controlParts(inv.control, input.switchAt, input.remoteOnOff, fuseA, V, lvdSoc);
  warnings.push(...control.warnings);

  const size = sized ? `${sized.awg} AWG (${sized.mm2} mm²)` : 'no single cable';
  const cableNotes = sized
    ? [
        `Drops ${sized.dropPercent.toFixed(2)} % (${sized.dropV.toFixed(3)} V) at ${r1(currentA)} A over ${sized.conductorLengthM} m of conductor, within 3 % (ABYC E-11, critical circuits).`,
        `Carries ${r1(sized.ampacityA)} A (33 CFR 183.425 Table 5, ${input.insulationC} °C insulation${input.engineSpace ? ', engine space' : ''}).`,
      ]
    : [];
  const ret: HookupPart =
    input.returnPath === 'cable'
      ? { kind: 'return', label: `${size} negative, ${input.feedLengthM} m`, ratingA: sized ? r1(sized.ampacityA) : null, notes: ['The same size as the positive: it carries the same current.'] }
      : {
          kind: 'return',
          label: 'Chassis return',
          ratingA: null,
          notes: [
            `The body carries the return; counted as ${CHASSIS_GROUND_ALLOWANCE_OHM * 1000} mΩ for its joints. Check the ground point: bare metal, a short cable of the feed's size, and measure the drop under load (Readings).`,
          ],
        };

  return {
    control: inv.control,
    connection: 'direct',
    feed: {
      currentA: r2(currentA),
      continuousA: r2(continuousA),
      awg: sized?.awg ?? null,
      mm2: sized?.mm2 ?? null,
      fuseA,
      dropPercent: sized?.dropPercent ?? null,
      lengthM: input.feedLengthM,
      returnPath: input.returnPath,
      cutOutV: cutOutVoltage(V),
    },
    parts: [
      battery,
      protection,
      ...control.parts,
      { kind: 'conductor', label: `${size} positive, ${input.feedLengthM} m`, ratingA: sized ? r1(sized.ampacityA) : null, notes: cableNotes },
      inverter,
      ret,
    ],
    warnings,
    cautions,
  };
}

/** The model's own default set point: the cut-off plus MODEL_DEFAULTS.lvdPointsAboveCutoff (as simulate.ts resolves it). */
function defaultLvdSoc(input: HookupInput): number {
  const chem = CHEMISTRY_DEFAULTS[input.battery.chemistry];
  const cutoff = input.battery.cutoffSocPercent ?? (input.battery.role === 'starter' ? chem.cutoffSocStarter : chem.cutoffSocHouse);
  return Math.min(100, cutoff + MODEL_DEFAULTS.lvdPointsAboveCutoff);
}
