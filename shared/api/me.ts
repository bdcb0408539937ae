import { z } from 'zod';

import { accountRoleSchema } from '../schemas/people';
import { emailPrefsSchema } from '../schemas/email-prefs';

export { emailPrefsSchema } from '../schemas/email-prefs';

/** GET /api/me: who is signed in, with their account role and households. */
export const meSchema = z.strictObject({
  user: z.strictObject({ id: z.string(), name: z.string(), email: z.string(), role: accountRoleSchema }),
  households: z.array(z.strictObject({ id: z.string(), name: z.string(), role: z.string() })),
});
export type Me = z.infer<typeof meSchema>;

/** GET and PUT /api/me/email-prefs: the preferences, and whether they were ever saved (else the defaults). */
export const savedEmailPrefsSchema = z.strictObject({ ...emailPrefsSchema.shape, saved: z.boolean() });
export type SavedEmailPrefs = z.infer<typeof savedEmailPrefsSchema>;
