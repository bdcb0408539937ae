import { z } from 'zod';

/** An ISO calendar date (YYYY-MM-DD) that exists. */
export const isoDateSchema = z
  .string({ error: 'Enter a date (YYYY-MM-DD).' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Enter a date (YYYY-MM-DD).')
  .refine((s) => {
    const [y, m, d] = s.split('-').map(Number);
    const t = new Date(Date.UTC(y, m - 1, d));
    return y >= 1900 && y <= 2200 && t.getUTCMonth() === m - 1 && t.getUTCDate() === d;
  }, 'Enter a date that exists, between 1900 and 2200.');

export const latitudeSchema = z.number({ error: 'Enter a latitude in degrees.' }).finite('Enter a number.').min(-90, 'At least -90.').max(90, 'At most 90.');
export const elevationSchema = z.number({ error: 'Enter a number.' }).finite('Enter a number.').min(-500, 'At least -500.').max(9000, 'At most 9,000.');
export const skySchema = z.enum(['clear', 'mixed', 'overcast']);

/** Where the rig stands: its latitude (south negative) and elevation above sea level. */
export const locationSchema = z.strictObject({ latitudeDeg: latitudeSchema, elevationM: elevationSchema.optional() });

/** POST /api/solar/daily. */
export const solarDailyInputSchema = z.strictObject({
  latitudeDeg: latitudeSchema,
  date: isoDateSchema,
  elevationM: elevationSchema.optional(),
  sky: skySchema.default('clear'),
});
export type SolarDailyInput = z.infer<typeof solarDailyInputSchema>;
