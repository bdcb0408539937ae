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

/** A saved cable run on a rig: its own current, the current of one of the rig's loads, or the rig's inverter. */
export const cableRunSchema = z
  .strictObject({
    label: z.string().trim().min(1, 'Name the run.').max(80),
    from: z.string().trim().max(80).default('Battery'),
    to: z.string().trim().max(80).default(''),
    lengthM: cableRunSizeFields.shape.lengthM,
    currentA: cableRunSizeFields.shape.currentA,
    loadId: z.uuid().optional(),
    /** The run feeds the rig's inverter: sized from its rating at its low-voltage cut-out. */
    inverterLink: z.boolean().default(false),
    maxDropPercent: cableRunSizeFields.shape.maxDropPercent,
    insulationC: cableRunSizeFields.shape.insulationC,
    engineSpace: z.boolean().default(false),
    returnPath: z.enum(['cable', 'chassis']).default('cable'),
    continuous: z.boolean().default(false),
    purpose: z.enum(['general', 'inverter']).default('general'),
    /** The wire already fitted, if any, to check against the size the run needs. */
    existingAwg: z.enum(['18', '16', '14', '12', '10', '8', '6', '4', '2', '1', '1/0', '2/0', '3/0', '4/0']).optional(),
    existingMm2: z.literal([1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95], 'Choose a standard size.').optional(),
  })
  .superRefine((run, ctx) => {
    const given = [run.currentA !== undefined, run.loadId !== undefined, run.inverterLink].filter(Boolean).length;
    if (given !== 1) {
      ctx.addIssue({ code: 'custom', path: ['currentA'], message: 'Give the current, or link the run to a load or to the inverter (one of them).' });
    }
  });
export type CableRunInput = z.infer<typeof cableRunSchema>;
export type CableRunForm = z.input<typeof cableRunSchema>;
export const cableRunParamsSchema = z.object({ rigId: z.uuid(), runId: z.uuid() });
