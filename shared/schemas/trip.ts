import { z } from 'zod';

import { elevationSchema, isoDateSchema, latitudeSchema, skySchema } from './solar';

const num = (min: number, max: number) => z.number({ error: 'Enter a number.' }).finite('Enter a number.').min(min, `At least ${min}.`).max(max, `At most ${max}.`);
const hour = z.number({ error: 'Enter an hour.' }).int('Enter a whole hour.').min(0, 'At least 0.').max(23, 'At most 23.');

/** A stay: nights at one place, its latitude, the expected low and high, shore power or not. */
export const stayLegSchema = z.strictObject({
  kind: z.literal('stay'),
  name: z.string().trim().min(1, 'Name the place.').max(80, 'At most 80 characters.'),
  latitudeDeg: latitudeSchema,
  elevationM: elevationSchema.optional(),
  nights: z.number({ error: 'Enter a number of nights.' }).int('Whole nights.').min(1, 'At least 1 night.').max(60, 'At most 60 nights.'),
  lowC: num(-50, 50),
  highC: num(-50, 60),
  shore: z.boolean().default(false),
  sky: skySchema.default('mixed'),
});

/** A drive: on a date, from an hour, for some minutes (between two stays, or an errand during one). */
export const driveLegSchema = z.strictObject({
  kind: z.literal('drive'),
  date: isoDateSchema,
  startHour: hour.default(10),
  minutes: num(1, 1440),
});

export const tripLegSchema = z.discriminatedUnion('kind', [stayLegSchema, driveLegSchema], { error: 'A leg is a stay or a drive.' });

const dayNumber = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / 86_400_000;

/** A dated trip: its stays follow one another from the start date; each drive happens on its own date. */
export const tripSchema = z
  .strictObject({
    name: z.string().trim().min(1, 'Name the trip.').max(80, 'At most 80 characters.'),
    startDate: isoDateSchema,
    /** Hour of the day a stay begins and ends (arrival and leaving). */
    arrivalHour: hour.default(15),
    /** A battery inside the living space stays warmer than the air outside. */
    batteryInCabin: z.boolean().default(false),
    /** The active trip is what the Outlook, the weekly report and the warnings follow. */
    active: z.boolean().default(false),
    legs: z.array(tripLegSchema).min(1, 'Add at least one stay.').max(30, 'At most 30 legs.'),
  })
  .superRefine((trip, ctx) => {
    const stays = trip.legs.filter((l) => l.kind === 'stay');
    if (!stays.length) ctx.addIssue({ code: 'custom', path: ['legs'], message: 'Add at least one stay.' });
    const nights = stays.reduce((s, l) => s + l.nights, 0);
    if (nights > 60) ctx.addIssue({ code: 'custom', path: ['legs'], message: `The stays add up to ${nights} nights; a trip covers at most 60.` });
    trip.legs.forEach((leg, i) => {
      if (leg.kind === 'stay' && leg.highC < leg.lowC) ctx.addIssue({ code: 'custom', path: ['legs', i, 'highC'], message: 'The high is below the low.' });
      if (leg.kind !== 'drive' || !isoDateSchema.safeParse(trip.startDate).success) return;
      const day = dayNumber(leg.date) - dayNumber(trip.startDate);
      if (day < 0) ctx.addIssue({ code: 'custom', path: ['legs', i, 'date'], message: 'This drive is before the trip starts.' });
      else if (day > nights) ctx.addIssue({ code: 'custom', path: ['legs', i, 'date'], message: 'This drive is after the last stay ends.' });
    });
  });

export type Trip = z.infer<typeof tripSchema>;
export type TripInput = z.input<typeof tripSchema>;
export type TripLeg = z.infer<typeof tripLegSchema>;
export type StayLeg = z.infer<typeof stayLegSchema>;
export type DriveLeg = z.infer<typeof driveLegSchema>;

export const tripParamsSchema = z.object({ tripId: z.uuid('Not a trip id.') });
