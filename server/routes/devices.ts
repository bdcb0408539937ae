import { Router } from 'express';

import { searchDevices } from '@/shared/devices';
import { deviceQuerySchema } from '@/shared/schemas/device';
import { parsed, validate } from '../middleware/validate';

/** Open: the device catalogue is the same for everyone and stores nothing (rate-limited in app.ts). */
export function devicesRouter() {
  const router = Router();
  router.get('/', validate(deviceQuerySchema, 'query'), (_req, res) => {
    const { q, category, limit } = parsed(res, deviceQuerySchema, 'query');
    res.set('Cache-Control', 'public, max-age=3600').json({ devices: searchDevices(q, category, limit) });
  });
  return router;
}
