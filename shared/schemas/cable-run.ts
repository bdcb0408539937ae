import { z } from 'zod';

// POST /api/cable-runs/size: one run from the battery to a device. lengthM is one way.
const number = () => z.number({ error: 'Enter a number.' }).finite();

export const cableRunSizeSchema = z.object({
  systemVoltage: number().min(6).max(60).default(12),
  currentA: number().gt(0, 'The current must be more than 0 A.').max(1000),
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

export type CableRunSizeInput = z.infer<typeof cableRunSizeSchema>;
export type CableRunSizeForm = z.input<typeof cableRunSizeSchema>;
