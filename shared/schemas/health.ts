import { z } from 'zod';

import './error-map';

export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  database: z.object({ connected: z.boolean(), latencyMs: z.number().nullable(), error: z.string().optional() }),
  version: z.string(),
  uptimeS: z.number(),
});
export type Health = z.infer<typeof healthSchema>;
