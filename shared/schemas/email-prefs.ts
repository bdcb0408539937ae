import { z } from 'zod';

import './error-map';

/** A time zone name the runtime knows (IANA, e.g. Europe/Lisbon). */
export const timeZoneSchema = z
  .string()
  .trim()
  .min(1, 'Choose a time zone.')
  .max(64)
  .refine((tz) => {
    try {
      new Intl.DateTimeFormat('en-US', { timeZone: tz });
      return true;
    } catch {
      return false;
    }
  }, 'Not a time zone this server knows (use a name such as Europe/Lisbon).');

/** Each person's e-mail preferences (Settings). Weekdays count from Monday = 0 to Sunday = 6. */
export const emailPrefsSchema = z.strictObject({
  reportsOn: z.boolean(),
  reportWeekday: z.number().int().min(0, 'Choose a weekday.').max(6, 'Choose a weekday.'),
  reportHour: z.number({ error: 'Choose an hour.' }).int('Choose a whole hour.').min(0, 'From 0 to 23.').max(23, 'From 0 to 23.'),
  timeZone: timeZoneSchema,
  warningsOn: z.boolean(),
  /** Warn when the margin falls to Tight (or worse), or only when it is Short. */
  warnAt: z.enum(['tight', 'short']),
  noteEmailsOn: z.boolean(),
});
export type EmailPrefs = z.infer<typeof emailPrefsSchema>;

export const DEFAULT_EMAIL_PREFS: EmailPrefs = { reportsOn: true, reportWeekday: 6, reportHour: 18, timeZone: 'UTC', warningsOn: true, warnAt: 'tight', noteEmailsOn: true };

export const unsubscribeQuerySchema = z.object({ token: z.string().min(10, 'The link is incomplete.').max(500) });

export const emailParamsSchema = z.object({ rigId: z.uuid(), emailId: z.uuid() });
