import { z } from 'zod';

import { DEVICE_CATEGORIES, type DeviceCategory } from '../devices';
import { loadSchema } from '../schemas/projection';

export { deviceQuerySchema } from '../schemas/device';

export const deviceSchema = z.strictObject({
  id: z.string(),
  name: z.string(),
  category: z.enum(DEVICE_CATEGORIES as [DeviceCategory, ...DeviceCategory[]]),
  /** A load as the load schema takes it (its defaults not filled in). */
  load: loadSchema,
  source: z.enum(['common practice', 'from memory']),
  note: z.string(),
});

/** GET /api/devices */
export const deviceListSchema = z.strictObject({ devices: z.array(deviceSchema) });
