import { z } from 'zod';

import { inverterConnectionSchema, inverterControlSchema } from '../schemas/projection';

// The model's answers as the API sends them (shared/energy computes them; these say their shape).
// Strict objects: a renamed or added field fails the contract tests (tests/server/api-contracts.test.ts).

const n = z.number();
const nn = z.number().nullable();
const figures = z.record(z.string(), z.union([z.number(), z.string(), z.null()]));

export const marginStateSchema = z.enum(['comfortable', 'tight', 'short']);
export const fixKindOutSchema = z.enum(['cutoff-switch', 'ignition-relay', 'low-voltage-disconnect', 'more-driving', 'more-battery', 'house-battery', 'solar']);

export const warningSchema = z.strictObject({ code: z.string(), message: z.string(), figures: figures.optional() });

export const fixSchema = z.strictObject({
  kind: fixKindOutSchema,
  daysGainedParked: n,
  daysGainedRoutine: n,
  outlastsHorizon: z.strictObject({ parked: z.boolean(), routine: z.boolean() }),
  ahPerDaySaved: n,
  summary: z.string(),
  convenience: z.string(),
  change: z.record(z.string(), z.unknown()),
  holds: z.boolean(),
  stops: z
    .strictObject({ loads: z.array(z.string()), essentialLoads: z.array(z.string()), when: z.enum(['parked', 'low-battery']), fromDay: nn, ahPerDayNotServed: n })
    .nullable(),
  cutsEssential: z.boolean(),
  figures,
});

const daysFigure = { daysToCutoff: nn, daysToFlat: nn };

/** POST /api/projections, and the heart of a rig's Outlook. */
export const projectionSchema = z.strictObject({
  parked: z.strictObject(daysFigure),
  routine: z.strictObject({ ...daysFigure, holds: z.boolean() }),
  daily: z.strictObject({ consumptionAh: n, chargeAh: n, netAh: n, offeredAh: n, notStoredAh: n }),
  balance: z.strictObject({ holds: z.boolean(), usedAh: n, putBackAh: n, offeredAh: n, notStoredAh: n, heatingAh: n, weeksRun: n }),
  standby: z.strictObject({ inverterIdleAh: n, keyOffAh: n, selfDischargeAh: n }),
  breakdown: z.array(z.strictObject({ name: z.string(), kind: z.enum(['load', 'standby']), supply: z.enum(['dc', 'ac']).nullable(), ahPerDay: n, share: n })),
  margin: z.strictObject({ days: nn, atLeastDays: nn, state: marginStateSchema, plannedStayDays: n, coveredDays: n }),
  start: z.strictObject({ socPercent: n, weekday: n, hourOfDay: n }),
  series: z.array(
    z.strictObject({ hour: n, weekday: n, hourOfDay: n, socPercent: n, parkedSocPercent: n, ah: n, netA: n, drivingMinutes: n, inverterOn: z.boolean() }),
  ),
  warnings: z.array(warningSchema),
  fixes: z.array(fixSchema),
  solar: z.strictObject({ source: z.enum(['place-and-date', 'peak-sun-hours']), dailyAh: z.array(n) }),
  assumptions: z.record(z.string(), z.union([z.number(), z.string(), z.boolean(), z.null()])),
  horizonDays: n,
  cutoffSocPercent: n,
});
export type ProjectionAnswer = z.infer<typeof projectionSchema>;

const compareSide = z.strictObject({ daysParked: nn, daysOnRoutine: nn, dailyAh: n, netAh: n, marginDays: nn, marginState: marginStateSchema });

/** Try a load: the rig without and with the candidates. */
export const comparisonSchema = z.strictObject({
  without: compareSide,
  with: compareSide,
  delta: z.strictObject({ daysParked: nn, daysOnRoutine: nn, dailyAh: n, netAh: n }),
  candidates: z.array(z.strictObject({ name: z.string(), ahPerDay: n })),
  warnings: z.array(warningSchema),
});
export type ComparisonAnswer = z.infer<typeof comparisonSchema>;

export const tripOutlookSchema = z.strictObject({
  startDate: z.string(),
  stays: z.array(
    z.strictObject({
      leg: n,
      name: z.string(),
      arriveAt: z.string(),
      leaveAt: z.string(),
      nights: n,
      batteryTemperatureC: n,
      temperatureFactor: n,
      shore: z.boolean(),
      sunAhPerDay: n,
      socOnArrivalPercent: n,
      socOnLeavingPercent: n,
      lowestSocPercent: n,
      daysToCutoff: nn,
      marginDays: nn,
      marginState: marginStateSchema,
      arrivesBelowCutoff: z.boolean(),
    }),
  ),
  drives: z.array(z.strictObject({ leg: n, date: z.string(), startHour: n, minutes: n })),
  series: z.array(z.strictObject({ hour: n, at: z.string(), socPercent: n, stay: n })),
  endSocPercent: n,
  cutoffSocPercent: n,
  marginState: marginStateSchema,
  tightestStay: z.string(),
  warnings: z.array(warningSchema),
  fixes: z.array(fixSchema),
});

const awgSchema = z.enum(['18', '16', '14', '12', '10', '8', '6', '4', '2', '1', '1/0', '2/0', '3/0', '4/0']);
const fails = z.array(z.enum(['drop', 'ampacity', 'protection']));

/** One cable run sized (POST /api/cable-runs/size, and each saved run's sizing). */
export const cableRunResultSchema = z.strictObject({
  currentA: n,
  basis: z.strictObject({ inverterW: n, cutoutV: n, efficiencyPercent: n, continuous: z.literal(true) }).nullable(),
  awg: awgSchema,
  mm2: n,
  dropV: n,
  dropPercent: n,
  ampacityA: n,
  fuseA: n,
  fuseKind: z.string(),
  breaker: z.strictObject({ type: z.string(), standard: z.string(), advice: z.string() }),
  protection: z.strictObject({ minimumA: n, maximumA: n, placement: z.string() }),
  conductorLengthM: n,
  nextSmaller: z.strictObject({ awg: awgSchema, dropV: n, dropPercent: n, ampacityA: n, fails }).nullable(),
  metric: z.strictObject({ mm2: n, dropV: n, dropPercent: n, ampacityA: n, fuseA: n }),
  metricNextSmaller: z.strictObject({ mm2: n, dropV: n, dropPercent: n, ampacityA: n, fails }).nullable(),
  cautions: z.array(z.string()),
});

const hookupPartKind = z.enum(['battery', 'protection', 'switching-breaker', 'switch', 'relay', 'remote-switch', 'coil-fuse', 'low-voltage-disconnect', 'socket', 'conductor', 'inverter', 'return']);

/** The inverter's hook-up, part by part. */
export const hookupPlanSchema = z.strictObject({
  control: inverterControlSchema,
  connection: inverterConnectionSchema,
  feed: z.strictObject({
    currentA: n,
    continuousA: n,
    awg: awgSchema.nullable(),
    mm2: nn,
    fuseA: nn,
    dropPercent: nn,
    lengthM: n,
    returnPath: z.enum(['cable', 'chassis', 'vehicle']),
    cutOutV: n,
  }),
  parts: z.array(z.strictObject({ kind: hookupPartKind, label: z.string(), ratingA: nn, notes: z.array(z.string()) })),
  warnings: z.array(z.strictObject({ code: z.string(), message: z.string() })),
  cautions: z.array(z.string()),
});

/** A record's drain over its quiet hours (without the spans the server keeps to itself). */
export const readingsAnalysisSchema = z.strictObject({
  drainA: nn,
  rangeA: z.tuple([n, n]).nullable(),
  method: z.enum(['current', 'monitor', 'voltage']).nullable(),
  hours: n,
  usableAh: n,
  flaggedRested: n,
  label: z.string(),
  reason: z.string().nullable(),
  notes: z.array(z.string()),
});

export const dropTestSchema = z.strictObject({ dropV: n, dropPercent: n, resistanceOhm: n, expectedDropV: nn, flagged: z.boolean(), message: z.string() });
