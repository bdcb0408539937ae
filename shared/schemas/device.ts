import { z } from 'zod';

import { DEVICE_CATEGORIES, type DeviceCategory } from '../devices';

/** GET /api/devices?q=fridge&category=Cooling: the catalogue, searched. */
export const deviceQuerySchema = z.strictObject({
  q: z.string().trim().max(60, 'At most 60 characters.').default(''),
  category: z.enum(DEVICE_CATEGORIES as [DeviceCategory, ...DeviceCategory[]]).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(200),
});
export type DeviceQuery = z.infer<typeof deviceQuerySchema>;
