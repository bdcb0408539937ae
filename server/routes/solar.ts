import { Router } from 'express';

import { dailySun } from '@/shared/energy/solar';
import { dailySunSchema, solarDailyInputSchema } from '@/shared/api/solar';
import { handler } from '../http/handler';

const round = (x: number, d: number) => Math.round(x * 10 ** d) / 10 ** d;

/** Open route: the sun of one day at a place (FAO-56); stores nothing (rate-limited in app.ts). */
export function solarRouter() {
  const router = Router();
  router.post('/daily', handler({ body: solarDailyInputSchema, response: dailySunSchema }, ({ body }) => {
    const sun = dailySun(body);
    return {
      extraterrestrialMJ: round(sun.extraterrestrialMJ, 2),
      clearSkyMJ: round(sun.clearSkyMJ, 2),
      daylightHours: round(sun.daylightHours, 2),
      peakSunHours: round(sun.peakSunHours, 2),
    };
  }));
  return router;
}
