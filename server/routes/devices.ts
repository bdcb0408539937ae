import { Router } from 'express';

import { searchDevices } from '@/shared/devices';
import { deviceListSchema, deviceQuerySchema } from '@/shared/api/devices';
import { handler } from '../http/handler';

/** Open: the device catalogue is the same for everyone and stores nothing (rate-limited in app.ts). */
export function devicesRouter() {
  const router = Router();
  router.get('/', handler({ query: deviceQuerySchema, response: deviceListSchema }, ({ query: { q, category, limit }, res }) => {
    res.set('Cache-Control', 'public, max-age=3600');
    return { devices: searchDevices(q, category, limit) };
  }));
  return router;
}
