import type { Logger } from 'pino';

import type { Db } from '@/db/client';
import type { Config } from '../config';
import type { Mailer } from '../mail';

/** What a job handler needs; the clock is here so that tests can say what time it is. */
export type Clock = { now: () => Date };
export type JobDeps = { config: Config; logger: Logger; db: Db; mailer: Mailer; clock: Clock };

export const QUEUES = {
  /** Every 10 minutes: which weekly reports are due now, each person in their own zone. */
  reportsTick: 'reports-tick',
  reportSend: 'report-send',
  marginCheck: 'margin-check',
  /** Once a day: every rig's margin, since a routine or a season moves it without an edit. */
  marginDaily: 'margin-daily',
  noteDigest: 'note-digest',
  /** An account e-mail: the password reset, and any (verification, invitation) whose first send failed. */
  mailRetry: 'mail-retry',
} as const;
