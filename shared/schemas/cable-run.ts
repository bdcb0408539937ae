import { z } from 'zod';

import './error-map';

// POST /api/cable-runs/size: one run from the battery to a device. lengthM is one way.
const number = () => z.number().finite();

const cableRunSizeFields = z.object({
  systemVoltage: number().min(6).max(60).default(12),
  currentA: number().gt(0, 'The current must be more than 0 A.').max(1000).optional(),
  /** In place of currentA, for a run that feeds an inverter (purpose 'inverter'): its rated watts. */
  inverterW: number().gt(0, 'The rating must be more than 0 W.').max(10_000).optional(),
  inverterEfficiencyPercent: number().min(50).max(100).default(90),
  lengthM: number().gt(0, 'The length must be more than 0 m.').max(100),
  maxDropPercent: number().gt(0, 'The allowed drop must be more than 0 %.').max(50, 'The allowed drop can be at most 50 %.').default(3),
  /** Insulation temperature rating, one of the columns of 33 CFR 183.425 Table 5. */
  insulationC: z.literal([60, 75, 80, 90, 105, 125, 200], 'Insulation rating must be 60, 75, 80, 90, 105, 125 or 200 °C.').default(105),
  engineSpace: z.boolean().default(false),
  returnPath: z.enum(['cable', 'chassis']).default('cable'),
  continuous: z.boolean().default(false),
  /** Conductor temperature for its resistance; 75 °C is the NEC Chapter 9 Table 8 basis. */
  conductorTemperatureC: number().min(-40).max(200).default(75),
  purpose: z.enum(['general', 'inverter']).default('general'),
});

export const cableRunSizeSchema = cableRunSizeFields.superRefine((run, ctx) => {
  if ((run.currentA === undefined) === (run.inverterW === undefined)) {
    ctx.addIssue({ code: 'custom', path: ['currentA'], message: "Give the current, or the inverter's rated watts (not both)." });
  }
  if (run.inverterW !== undefined && run.purpose !== 'inverter') {
    ctx.addIssue({ code: 'custom', path: ['purpose'], message: "A run sized from an inverter's watts has the purpose 'inverter'." });
  }
});

export type CableRunSizeInput = z.infer<typeof cableRunSizeSchema>;
export type CableRunSizeForm = z.input<typeof cableRunSizeSchema>;

/** Where the cable runs sets the derating: the engine bay is hot (33 CFR 183.425's engine-space factor). */
export const CIRCUIT_ROUTES = {
  cabin: { label: 'Inside the cabin', engineSpace: false },
  'under-floor': { label: 'Under the floor', engineSpace: false },
  'engine-bay': { label: 'Through the engine bay', engineSpace: true },
} as const;
export type CircuitRoute = keyof typeof CIRCUIT_ROUTES;

/**
 * The cable's type sets its insulation rating, one of 33 CFR 183.425 Table 5's columns (ratings from memory of
 * the cable standards). Every column has one type, so a run saved with only a rating has its type (migration 023).
 */
export const CABLE_TYPES = {
  pvc: { label: 'PVC automotive (GPT)', insulationC: 80 },
  xlpe: { label: 'Cross-linked automotive (GXL, TXL)', insulationC: 125 },
  marine: { label: 'Tinned marine cable', insulationC: 105 },
  welding: { label: 'Welding cable', insulationC: 90 },
  'other-60': { label: 'Other cable', insulationC: 60 },
  'other-75': { label: 'Other cable', insulationC: 75 },
  'high-temperature': { label: 'High-temperature cable (silicone, PTFE)', insulationC: 200 },
} as const;
export type CableType = keyof typeof CABLE_TYPES;
export const cableTypeKeys = Object.keys(CABLE_TYPES) as [CableType, ...CableType[]];
export const routeKeys = Object.keys(CIRCUIT_ROUTES) as [CircuitRoute, ...CircuitRoute[]];

export const AWG_CHOICES = ['18', '16', '14', '12', '10', '8', '6', '4', '2', '1', '1/0', '2/0', '3/0', '4/0'] as const;

/**
 * The one field list of a circuit, shared by Wire a circuit (the calculator), a rig's saved runs and the
 * server: what is at the end of the wire, its current, where it runs, the cable, its length, the return, the
 * drop it may lose, whether it runs for hours, and the wire already fitted (to check it).
 */
export const cableRunFields = z.object({
  /** The device at the end of the wire, in the owner's words (drawn at the end of the cable). */
  to: z.string().trim().max(80).default(''),
  currentA: cableRunSizeFields.shape.currentA,
  route: z.enum(routeKeys, 'Choose where it runs: the cabin, under the floor or the engine bay.').default('cabin'),
  cableType: z.enum(cableTypeKeys, 'Choose one of the cable types.').default('marine'),
  lengthM: cableRunSizeFields.shape.lengthM,
  returnPath: z.enum(['cable', 'chassis']).default('cable'),
  /** 3 % for electronics and feeds, 10 % for other loads (ABYC E-11). */
  maxDropPercent: cableRunSizeFields.shape.maxDropPercent,
  continuous: z.boolean().default(false),
  existingAwg: z.enum(AWG_CHOICES).optional(),
});
export type CableRunFields = z.input<typeof cableRunFields>;

/** A saved cable run on a rig: the circuit's fields, a name, and its current typed in, from one of the rig's loads, or from the rig's inverter. */
export const cableRunSchema = cableRunFields
  .extend({
    label: z.string().trim().min(1, 'Name the run.').max(80),
    from: z.string().trim().max(80).default('Battery'),
    loadId: z.uuid().optional(),
    /** The run feeds the rig's inverter: sized from its rating at its low-voltage cut-out. */
    inverterLink: z.boolean().default(false),
    purpose: z.enum(['general', 'inverter']).default('general'),
    existingMm2: z.literal([1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95], 'Choose a standard size.').optional(),
  })
  .strict()
  .superRefine((run, ctx) => {
    const given = [run.currentA !== undefined, run.loadId !== undefined, run.inverterLink].filter(Boolean).length;
    if (given !== 1) {
      ctx.addIssue({ code: 'custom', path: ['currentA'], message: 'Give the current, or link the run to a load or to the inverter (one of them).' });
    }
  });
export type CableRunInput = z.infer<typeof cableRunSchema>;
export type CableRunForm = z.input<typeof cableRunSchema>;
export const cableRunParamsSchema = z.object({ rigId: z.uuid(), runId: z.uuid() });
