import { z } from 'zod';

export { unsubscribeQuerySchema } from '../schemas/email-prefs';

/** POST /api/email/unsubscribe (RFC 8058 one-click): which list was turned off. */
export const unsubscribedSchema = z.strictObject({ list: z.enum(['reports', 'warnings', 'notes']), on: z.literal(false) });
