import { z } from 'zod';

import { accountRoleSchema } from '../schemas/people';
import { emailPrefsSchema } from '../schemas/email-prefs';

export { emailPrefsSchema } from '../schemas/email-prefs';
export { unitsSchema } from '../schemas/units';

/** PUT /api/me/units answers the unit kept; GET /api/me carries it too. */
export const savedUnitsSchema = z.strictObject({ energy: z.enum(['Ah', 'Wh']), saved: z.boolean() });
export type SavedUnits = z.infer<typeof savedUnitsSchema>;

/** GET /api/me: who is signed in, with their account role, households and energy unit. */
export const meSchema = z.strictObject({
  user: z.strictObject({ id: z.string(), name: z.string(), email: z.string(), role: accountRoleSchema }),
  households: z.array(z.strictObject({ id: z.string(), name: z.string(), role: z.string() })),
  /** The energy unit kept on the account (the e-mails use it); saved is false while never chosen. */
  units: savedUnitsSchema,
});
export type Me = z.infer<typeof meSchema>;

/** GET and PUT /api/me/email-prefs: the preferences, and whether they were ever saved (else the defaults). */
export const savedEmailPrefsSchema = z.strictObject({ ...emailPrefsSchema.shape, saved: z.boolean() });
export type SavedEmailPrefs = z.infer<typeof savedEmailPrefsSchema>;
