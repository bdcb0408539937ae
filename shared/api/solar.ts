import { z } from 'zod';

export { solarDailyInputSchema } from '../schemas/solar';

/** POST /api/solar/daily: FAO-56's day at a place, each figure to two decimals. */
export const dailySunSchema = z.strictObject({ extraterrestrialMJ: z.number(), clearSkyMJ: z.number(), daylightHours: z.number(), peakSunHours: z.number() });
