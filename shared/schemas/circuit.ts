import { z } from 'zod';

import { feedCurrentA } from '../energy/hookup/feed';
import { cableRunSizeSchema, type CableRunSizeForm } from './cable-run';

// Wire a circuit: the stand-alone calculator's form, starting from what is at the end of the wire. It
// becomes a cable-run sizing (POST /api/cable-runs/size) through circuitToRun.

/** Where the cable runs sets the derating: the engine bay is hot (33 CFR 183.425's engine-space factor). */
export const CIRCUIT_ROUTES = {
  cabin: { label: 'Inside the cabin', engineSpace: false },
  'under-floor': { label: 'Under the floor', engineSpace: false },
  'engine-bay': { label: 'Through the engine bay', engineSpace: true },
} as const;

/** The cable's type sets its insulation rating, one of Table 5's columns (ratings from memory of the cable standards). */
export const CABLE_TYPES = {
  pvc: { label: 'PVC automotive (GPT)', insulationC: 80 },
  xlpe: { label: 'Cross-linked automotive (GXL, TXL)', insulationC: 125 },
  marine: { label: 'Tinned marine cable', insulationC: 105 },
  welding: { label: 'Welding cable', insulationC: 90 },
} as const;

/** The words both circuit forms use (Wire a circuit and a rig's saved runs), so their labels cannot drift. */
export const CIRCUIT_LABELS = {
  end: 'At the end of the wire',
  current: 'Current the device draws',
  length: 'Length, battery to device',
  lengthHint: 'One way; the return is counted for you.',
  route: 'Where it runs',
  routeHint: 'The engine bay\'s heat lowers what a cable may carry.',
  engineBay: 'Runs through the engine bay',
  cableType: 'Cable type',
  return: 'Return',
  continuous: 'Runs 3 hours or more at a time',
} as const;
export const RETURN_OPTIONS = [
  { value: 'cable' as const, label: 'Its own negative cable' },
  { value: 'chassis' as const, label: 'Through the chassis' },
];
/** Cable types as choices of an insulation rating, with Table 5's other columns for runs saved before. */
export const INSULATION_OPTIONS = [
  ...Object.values(CABLE_TYPES).map((c) => ({ value: c.insulationC as number, label: `${c.label}, ${c.insulationC} °C` })),
  { value: 60, label: 'Other cable, 60 °C' },
  { value: 75, label: 'Other cable, 75 °C' },
];

// Messages for a missing or non-numeric figure come from the plain error map (error-map.ts), naming the field.
const number = () => z.number().finite();

export const circuitSchema = z
  .object({
    systemVoltage: cableRunSizeSchema.shape.systemVoltage,
    end: z.enum(['device', 'inverter']).default('device'),
    currentA: number().gt(0, 'The current must be more than 0 A.').max(1000).optional(),
    inverterW: number().gt(0, 'The inverter\'s rating must be more than 0 W.').max(10_000).optional(),
    efficiencyPercent: number().min(50).max(100).default(90),
    route: z.enum(['cabin', 'under-floor', 'engine-bay']).default('cabin'),
    cableType: z.enum(['pvc', 'xlpe', 'marine', 'welding']).default('xlpe'),
    lengthM: cableRunSizeSchema.shape.lengthM,
    /** Critical (electronics, an inverter feed) allows 3 %, anything else 10 % (ABYC E-11). */
    critical: z.boolean().default(true),
    returnPath: z.enum(['cable', 'chassis']).default('cable'),
    continuous: z.boolean().default(false),
  })
  .superRefine((c, ctx) => {
    if (c.end === 'device' && c.currentA === undefined) ctx.addIssue({ code: 'custom', path: ['currentA'], message: 'Give the current the device draws.' });
    if (c.end === 'inverter' && c.inverterW === undefined) ctx.addIssue({ code: 'custom', path: ['inverterW'], message: 'Give the inverter\'s rated watts.' });
  });
export type CircuitInput = z.infer<typeof circuitSchema>;
export type CircuitForm = z.input<typeof circuitSchema>;

/** The circuit as a cable run to size: an inverter's feed from its watts at the 10.5 V cut-out, as a continuous load. */
export function circuitToRun(c: CircuitInput): CableRunSizeForm {
  const inverter = c.end === 'inverter';
  return {
    systemVoltage: c.systemVoltage,
    currentA: inverter ? Math.round(feedCurrentA(c.inverterW!, c.efficiencyPercent, c.systemVoltage) * 100) / 100 : c.currentA!,
    lengthM: c.lengthM,
    maxDropPercent: c.critical || inverter ? 3 : 10,
    insulationC: CABLE_TYPES[c.cableType].insulationC,
    engineSpace: CIRCUIT_ROUTES[c.route].engineSpace,
    returnPath: c.returnPath,
    continuous: inverter || c.continuous,
    purpose: inverter ? 'inverter' : 'general',
  };
}
