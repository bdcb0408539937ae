import { pino, type Logger } from 'pino';

import { createDb, type Db } from '@/db/client';
import { type Auth, createAuth } from './auth';
import { type Config, loadConfig } from './config';
import { createJobs, type Jobs } from './jobs/queue';
import type { Clock } from './jobs/types';
import { createMailer, type Mailer } from './mail';
import { createStorage, type Storage } from './storage';

/** Everything the app is built from, made once: configuration, logger, database, mailer, auth, the clock, the job queue and object storage. */
export type AppContext = { config: Config; logger: Logger; db: Db; mailer: Mailer; auth: Auth; clock: Clock; jobs: Jobs; storage: Storage };

export function createContext(env: NodeJS.ProcessEnv = process.env, overrides: Partial<AppContext> = {}): AppContext {
  const config = overrides.config ?? loadConfig(env);
  const logger = overrides.logger ?? pino({ level: config.LOG_LEVEL });
  const db = overrides.db ?? createDb(config.DATABASE_URL);
  const mailer = overrides.mailer ?? createMailer(config, logger);
  const clock = overrides.clock ?? { now: () => new Date() };
  const jobs = overrides.jobs ?? createJobs({ config, logger, db, mailer, clock });
  const auth = overrides.auth ?? createAuth({ config, db, mailer, logger, retryMail: jobs.retryMail, queueMail: jobs.queueMail });
  const storage = overrides.storage ?? createStorage(config);
  return { config, logger, db, mailer, auth, clock, jobs, storage };
}
