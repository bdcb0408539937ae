import { z } from 'zod';

import { isoDateSchema, locationSchema, skySchema } from './solar';
import './error-map';

// The energy model's input: a public contract (POST /api/projections). Fields may be added; the names stay.
// Optional fields take the defaults in shared/energy/defaults.ts (documented in docs/model.md).

// Messages come from ./error-map, which names the field and its unit.
const num = (min: number, max: number) => z.number().finite().min(min).max(max);

export const chemistrySchema = z.enum(['flooded', 'agm', 'gel', 'lifepo4']);
export const batteryRoleSchema = z.enum(['house', 'starter']);
export const inverterControlSchema = z.enum(['always-on', 'manual-switch', 'ignition-relay', 'low-voltage-disconnect']);
/** Where the inverter takes its power: wired to the battery, or plugged into an accessory (lighter) socket. */
export const inverterConnectionSchema = z.enum(['direct', 'socket']);
export const supplySchema = z.enum(['dc', 'ac']);
export const whenSchema = z.enum(['always', 'parked', 'driving']);
export const loadStatusSchema = z.enum(['installed', 'candidate']);
export const weekdaySchema = z.number().int().min(0).max(6);

export const batterySchema = z.object({
  chemistry: chemistrySchema,
  capacityAh: num(1, 20_000),
  healthPercent: num(1, 100).default(100),
  temperatureC: num(-40, 60).default(25),
  startSocPercent: num(0, 100).default(100),
  role: batteryRoleSchema.default('house'),
  cutoffSocPercent: num(0, 100).optional(),
  // Overrides of the chemistry's defaults.
  peukertExponent: num(1, 1.6).optional(),
  ratedHours: num(1, 100).optional(),
  chargeEfficiencyPercent: num(50, 100).optional(),
  selfDischargePercentPerMonth: num(0, 50).optional(),
  temperatureFactor: num(0.05, 1).optional(),
  bulkAcceptanceC: num(0.01, 3).optional(),
  taperStartSocPercent: num(50, 100).optional(),
  /** A self-heating LiFePO4 battery warms itself from a charging source before it accepts charge below 0 °C. */
  selfHeating: z.boolean().default(false),
  /** The heater's draw while it warms, in watts (default in shared/energy/defaults.ts). */
  heaterW: num(0, 1000).optional(),
  /** Minutes of charging-source time the heater needs before the battery accepts charge. */
  heaterWarmupMinutes: num(0, 600).optional(),
});

export const inverterSchema = z.object({
  ratedW: num(1, 10_000),
  efficiencyPercent: num(50, 100).default(90),
  idleA: num(0, 20).default(0.5),
  control: inverterControlSchema.default('always-on'),
  /** Low-voltage disconnect: the state of charge at which the inverter switches itself off. */
  lvdSocPercent: num(0, 100).optional(),
  /** Low-voltage disconnect: points above the threshold at which it switches back on. */
  lvdReconnectPoints: num(1, 50).optional(),
  /** Wired to the battery, or plugged into an accessory (lighter) socket (SAE J563). */
  connection: inverterConnectionSchema.default('direct'),
  /** The socket's fuse in the vehicle's fuse box: SAE J563 sockets are fused at 10, 15 or 20 A (common practice). */
  socketFuseA: num(1, 40).default(15),
  /** True when the socket is live only with the ignition on. */
  socketSwitched: z.boolean().default(false),
});

export const loadSchema = z
  .strictObject({
    name: z.string().trim().min(1).max(80),
    supply: supplySchema,
    watts: num(0, 10_000).optional(),
    amps: num(0, 800).optional(),
    dutyPercent: num(0, 100).default(100),
    hoursPerDay: num(0, 24),
    startHour: z.number().int().min(0).max(23).optional(),
    weekdays: z.array(weekdaySchema).min(1).max(7).optional(),
    when: whenSchema.default('always'),
    status: loadStatusSchema.default('installed'),
    quantity: z.number().int().min(1).max(100).default(1),
    /** An essential load (a CPAP, a medical device): a Fix that would stop it says so. */
    essential: z.boolean().optional(),
  })
  .superRefine((load, ctx) => {
    if ((load.watts === undefined) === (load.amps === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['watts'], message: 'Give either watts or amps, not both or neither.' });
    }
  });

export const shoreSchema = z.object({
  amps: num(0, 200),
  hoursPerDay: num(0, 24),
  startHour: z.number().int().min(0).max(23).default(20),
  weekdays: z.array(weekdaySchema).max(7).default([]),
});

export const chargingSchema = z.object({
  alternatorA: num(0, 500).default(0),
  /** Minutes of driving per weekday, Monday first. */
  drivingMinutesPerDay: z.array(num(0, 1440)).length(7).default([0, 0, 0, 0, 0, 0, 0]),
  /** Hour of day when each day's driving begins. */
  drivingStartHour: z.number().int().min(0).max(23).default(10),
  /** How the alternator charges the battery: a voltage-sensitive relay or a DC-DC charger (alternatorA is then its rating). */
  charger: z.enum(['relay', 'dc-dc']).default('relay'),
  /** Minutes into each drive before a relay joins (the starting battery must first reach its join voltage). */
  relayJoinMinutes: num(0, 60).optional(),
  solarW: num(0, 5_000).default(0),
  peakSunHours: num(0, 12).default(0),
  solarDeratePercent: num(10, 100).optional(),
  shore: shoreSchema.optional(),
});

/** The rig's power system and routine, without the loads: what a saved rig stores beside its loads. */
export const projectionBaseSchema = z.object({
    systemVoltage: num(6, 60).default(12),
    battery: batterySchema,
    inverter: inverterSchema.nullable().default(null),
    keyOffDrawA: num(0, 10).default(0),
    loads: z.array(loadSchema).max(200).default([]),
    charging: chargingSchema.default({
      alternatorA: 0,
      drivingMinutesPerDay: [0, 0, 0, 0, 0, 0, 0],
      drivingStartHour: 10,
      charger: 'relay',
      solarW: 0,
      peakSunHours: 0,
    }),
    plannedStayDays: num(0, 60).default(0),
    horizonDays: z.number().int().min(1).max(60).default(14),
    start: z
      .object({
        weekday: weekdaySchema.default(0),
        hour: z.number().int().min(0).max(23).default(18),
        /** A calendar date: the run then follows it (its weekday wins over `weekday`). */
        date: isoDateSchema.optional(),
      })
      .default({ weekday: 0, hour: 18 }),
    /** Where the rig stands: with start.date and no peakSunHours, each day's sun comes from FAO-56 (solar.ts). */
    location: locationSchema.extend({ sky: skySchema.optional() }).optional(),
});

export const rigPowerSchema = projectionBaseSchema.omit({ loads: true });
export type RigPower = z.infer<typeof rigPowerSchema>;
export type RigPowerInput = z.input<typeof rigPowerSchema>;

export const projectionInputSchema = projectionBaseSchema.superRefine((input, ctx) => {
    if (!input.inverter) {
      input.loads.forEach((load, i) => {
        if (load.supply === 'ac') {
          ctx.addIssue({ code: 'custom', path: ['loads', i, 'supply'], message: 'An AC load needs an inverter; add one or make the load DC.' });
        }
      });
    }
  });

export type ProjectionInput = z.infer<typeof projectionInputSchema>;
export type ProjectionInputRaw = z.input<typeof projectionInputSchema>;
export type Load = z.infer<typeof loadSchema>;
export type LoadInput = z.input<typeof loadSchema>;
export type Chemistry = z.infer<typeof chemistrySchema>;
export type InverterControl = z.infer<typeof inverterControlSchema>;
export type InverterConnection = z.infer<typeof inverterConnectionSchema>;

export const compareInputSchema = z.object({
  rig: projectionInputSchema,
  /** Candidate loads to try; the rig's own loads with status "candidate" are tried as well. */
  candidates: z.array(loadSchema).max(50).default([]),
});
export type CompareInput = z.infer<typeof compareInputSchema>;
