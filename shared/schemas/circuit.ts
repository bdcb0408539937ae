import { z } from 'zod';

import { feedCurrentA } from '../energy/hookup/feed';
import { CABLE_TYPES, cableRunFields, cableRunSizeSchema, type CableRunSizeForm, CIRCUIT_ROUTES } from './cable-run';

// Wire a circuit: the stand-alone calculator. Its fields are the circuit's own (cableRunFields, the same
// list a saved run has) plus what a rig would otherwise answer: the system voltage and, for an inverter at
// the end of the wire, its rated watts and efficiency. It becomes a cable-run sizing (POST
// /api/cable-runs/size) through circuitToRun.

export { CABLE_TYPES, CIRCUIT_ROUTES } from './cable-run';

/** The words of the one circuit form (Wire a circuit and a rig's saved runs). */
export const CIRCUIT_LABELS = {
  end: 'At the end of the wire',
  to: 'Device',
  toHint: 'What the wire feeds, in your words; drawn at the end of the cable.',
  current: 'Current the device draws',
  currentHint: 'The most it draws from the battery.',
  inverterW: "Inverter's rated output",
  inverterHint: 'Its feed is sized at full output near the 10.5 V cut-out, as a continuous load.',
  efficiency: "Inverter's efficiency",
  length: 'Length, battery to device',
  lengthHint: 'One way; the return is counted for you.',
  route: 'Where it runs',
  routeHint: "The engine bay's heat lowers what a cable may carry.",
  cableType: 'Cable type',
  return: 'Return',
  allowedDrop: 'Drop it may lose',
  allowedDropHint: '3 % for electronics and feeds, 10 % for other loads (ABYC E-11).',
  continuous: 'Runs 3 hours or more at a time',
  existingAwg: 'Wire already fitted (to check it)',
  systemVoltage: 'System voltage',
} as const;
export const RETURN_OPTIONS = [
  { value: 'cable' as const, label: 'Its own negative cable' },
  { value: 'chassis' as const, label: 'Through the chassis' },
];
export const ROUTE_OPTIONS = Object.entries(CIRCUIT_ROUTES).map(([value, r]) => ({ value: value as keyof typeof CIRCUIT_ROUTES, label: r.label }));
export const CABLE_TYPE_OPTIONS = Object.entries(CABLE_TYPES).map(([value, c]) => ({ value: value as keyof typeof CABLE_TYPES, label: `${c.label}, ${c.insulationC} °C` }));

const number = () => z.number().finite();

export const circuitSchema = cableRunFields
  .extend({
    systemVoltage: cableRunSizeSchema.shape.systemVoltage,
    end: z.enum(['device', 'inverter']).default('device'),
    inverterW: number().gt(0, "The inverter's rating must be more than 0 W.").max(10_000).optional(),
    efficiencyPercent: number().min(50).max(100).default(90),
  })
  .superRefine((c, ctx) => {
    if (c.end === 'device' && c.currentA === undefined) ctx.addIssue({ code: 'custom', path: ['currentA'], message: 'Give the current the device draws.' });
    if (c.end === 'inverter' && c.inverterW === undefined) ctx.addIssue({ code: 'custom', path: ['inverterW'], message: "Give the inverter's rated watts." });
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
    maxDropPercent: c.maxDropPercent,
    insulationC: CABLE_TYPES[c.cableType].insulationC,
    engineSpace: CIRCUIT_ROUTES[c.route].engineSpace,
    returnPath: c.returnPath,
    continuous: inverter || c.continuous,
    purpose: inverter ? 'inverter' : 'general',
  };
}
