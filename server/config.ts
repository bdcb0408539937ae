import { z } from 'zod';

import { DEFAULT_AUTH_SECRET, MIN_SECRET_LENGTH } from './security/secrets';

// Read once at start-up, checked, with safe local defaults.
const configSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65535).default(8080),
  DATABASE_URL: z.string().default('postgres://keyoff@127.0.0.1:54329/keyoff'),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().default(1025),
  SMTP_SECURE: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default('Keyoff <no-reply@keyoff.example.org>'),
  /** Signs sessions; every other key is derived from it. The default is for development and tests only. */
  AUTH_SECRET: z.string().min(MIN_SECRET_LENGTH).default(DEFAULT_AUTH_SECRET),
  /** E-mail addresses that become admins when they sign up (comma-separated). */
  ADMIN_EMAILS: z
    .string()
    .default('')
    .transform((v) => v.split(',').map((s) => s.trim().toLowerCase()).filter(Boolean)),
  /** Extra origins allowed to call the auth routes (the Expo dev server in `npm run dev`). */
  TRUSTED_ORIGINS: z
    .string()
    .default('')
    .transform((v) => v.split(',').map((s) => s.trim()).filter(Boolean)),
  SIGN_IN_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(10),
  /** A password-reset request answers no sooner than this, known address or not. */
  RESET_ANSWER_MS: z.coerce.number().int().min(0).max(5000).default(300),
  /** The app's public address (not BASE_URL: vitest sets that one to "/"). */
  KEYOFF_URL: z.string().url().default('http://127.0.0.1:8080'),
  /** Folder of the exported web build the server serves in production. */
  WEB_DIST: z.string().default('dist'),
  SERVE_WEB: z
    .enum(['true', 'false'])
    .optional()
    .transform((v) => (v === undefined ? undefined : v === 'true')),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  RATE_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(120),
  /** Invitation e-mails (new or resent) one person may send in an hour, across their households. */
  INVITES_PER_INVITER_PER_HOUR: z.coerce.number().int().min(1).default(10),
  /** Invitation e-mails one household may send in a day, whoever sends them. */
  INVITES_PER_HOUSEHOLD_PER_DAY: z.coerce.number().int().min(1).default(20),
  /** pg-boss keeps its jobs in this schema of the same database. */
  JOBS_SCHEMA: z.string().regex(/^[a-z_][a-z0-9_]*$/).default('pgboss'),
  /** Whether this process runs the job workers and the schedules (every server process may). */
  RUN_WORKERS: z
    .enum(['true', 'false'])
    .default('true')
    .transform((v) => v === 'true'),
  JOB_POLL_SECONDS: z.coerce.number().min(0.5).max(60).default(2),
  /** First retry of a failed e-mail after this many seconds, doubling each time (pg-boss backoff). */
  JOB_RETRY_DELAY_SECONDS: z.coerce.number().int().min(1).default(30),
  JOB_RETRY_LIMIT: z.coerce.number().int().min(0).default(10),
  /** A send that started this long ago without finishing is taken to have crashed and may be tried again. */
  SEND_LEASE_SECONDS: z.coerce.number().int().min(1).default(300),
  /** Object storage for logs and photos (s3rver on loopback locally; any S3-compatible service). */
  S3_ENDPOINT: z.string().url().default('http://127.0.0.1:4569'),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().default('keyoff'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  /** How long a download address handed to a browser works. */
  SIGNED_URL_SECONDS: z.coerce.number().int().min(1).max(3600).default(300),
  /** Several notes within this many seconds make one e-mail. */
  NOTE_EMAIL_GATHER_SECONDS: z.coerce.number().int().min(0).default(600),
});

export type Config = z.infer<typeof configSchema>;

// Production never runs on the repository's default secret (anyone could forge sessions and links with it).
const checkedSchema = configSchema.superRefine((c, ctx) => {
  if (c.NODE_ENV === 'production' && c.AUTH_SECRET === DEFAULT_AUTH_SECRET) {
    ctx.addIssue({ code: 'custom', path: ['AUTH_SECRET'], message: 'production refuses the repository default: set AUTH_SECRET (npm start makes one in .data/auth-secret)' });
  }
});

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = checkedSchema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`Bad configuration: ${problems}`);
  }
  return parsed.data;
}
