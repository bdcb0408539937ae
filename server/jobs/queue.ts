import PgBoss from 'pg-boss';

import type { Mail } from '../mail';

import { checkMargin, queueDailyMarginChecks } from './margin';
import { sendNoteDigest } from './notes';
import { enqueueDueReports, sendReport, type ReportJob } from './reports';
import { type JobDeps, QUEUES } from './types';

export type Jobs = {
  boss: PgBoss;
  /** Installs pg-boss's schema and its queues; with workers, also runs the handlers and the schedules. */
  start: (opts?: { workers?: boolean }) => Promise<void>;
  stop: () => Promise<void>;
  /** After a change to a rig: check its margin soon (one check per rig at a time). */
  rigChanged: (rigId: string) => Promise<void>;
  /** A new note: tell the others on the rig, gathered over NOTE_EMAIL_GATHER_SECONDS. */
  noteWritten: (rigId: string, recipients: string[]) => Promise<void>;
  /** An account e-mail that failed at once: retried with backoff until the SMTP server takes it. */
  retryMail: (mail: Mail) => Promise<void>;
  /** An account e-mail sent by a worker as soon as one is free (the password reset). */
  queueMail: (mail: Mail) => Promise<void>;
};

/** pg-boss on the project's own PostgreSQL: jobs survive restarts and several server processes share them. */
export function createJobs(deps: JobDeps): Jobs {
  const { config, logger } = deps;
  const boss = new PgBoss({
    connectionString: config.DATABASE_URL,
    schema: config.JOBS_SCHEMA,
    max: 4,
    application_name: 'keyoff-jobs',
    // Only a process that runs workers keeps the queue tidy and fires the schedules.
    supervise: config.RUN_WORKERS,
    schedule: config.RUN_WORKERS,
  });
  boss.on('error', (err) => logger.error({ err }, 'job queue error'));
  let started: Promise<void> | null = null;
  const retry = { retryLimit: config.JOB_RETRY_LIMIT, retryDelay: config.JOB_RETRY_DELAY_SECONDS, retryBackoff: true };
  const poll = { pollingIntervalSeconds: config.JOB_POLL_SECONDS };

  /** Runs each job of a batch on its own: one failure fails only its job (pg-boss retries it). */
  const each = <T extends object>(name: string, fn: (data: T) => Promise<unknown>) =>
    boss.work<T>(name, { ...poll, batchSize: 8 }, async (jobs) => {
      await Promise.all(
        jobs.map(async (job) => {
          try {
            await fn(job.data);
          } catch (err) {
            logger.warn({ err, queue: name, job: job.id }, 'job failed; pg-boss retries it');
            await boss.fail(name, job.id, { message: err instanceof Error ? err.message : String(err) });
          }
        }),
      );
    });

  const jobs: Jobs = {
    boss,
    start(opts = {}) {
      started ??= (async () => {
        await boss.start();
        await boss.createQueue(QUEUES.reportsTick, { name: QUEUES.reportsTick, policy: 'singleton', retryLimit: 0 });
        await boss.createQueue(QUEUES.marginDaily, { name: QUEUES.marginDaily, policy: 'singleton', retryLimit: 2 });
        await boss.createQueue(QUEUES.reportSend, { name: QUEUES.reportSend, ...retry });
        await boss.createQueue(QUEUES.marginCheck, { name: QUEUES.marginCheck, policy: 'short', ...retry });
        await boss.createQueue(QUEUES.noteDigest, { name: QUEUES.noteDigest, policy: 'short', ...retry });
        await boss.createQueue(QUEUES.mailRetry, { name: QUEUES.mailRetry, ...retry });
        if (opts.workers ?? config.RUN_WORKERS) {
          if (!config.RUN_WORKERS) throw new Error('workers asked for, but RUN_WORKERS is false');
          await boss.schedule(QUEUES.reportsTick, '*/10 * * * *', {});
          await boss.schedule(QUEUES.marginDaily, '0 5 * * *', {});
          await each<{ at?: string }>(QUEUES.reportsTick, (d) => enqueueDueReports(deps, jobs, d.at ? new Date(d.at) : deps.clock.now()));
          await each(QUEUES.marginDaily, () => queueDailyMarginChecks(deps, jobs));
          await each<ReportJob>(QUEUES.reportSend, (d) => sendReport(deps, d));
          await each<{ rigId: string }>(QUEUES.marginCheck, (d) => checkMargin(deps, d.rigId));
          await each<{ rigId: string; userId: string }>(QUEUES.noteDigest, (d) => sendNoteDigest(deps, d));
          await each<{ mail: Mail }>(QUEUES.mailRetry, (d) => deps.mailer.send(d.mail));
        }
      })();
      return started;
    },
    async stop() {
      if (!started) return;
      await started.catch(() => undefined);
      started = null;
      await boss.stop({ graceful: true, wait: true, timeout: 15_000 });
    },
    async rigChanged(rigId) {
      try {
        // A short queue keeps one waiting check per rig: a burst of edits makes one check.
        await boss.send(QUEUES.marginCheck, { rigId }, { singletonKey: rigId });
      } catch (err) {
        // The daily check catches up; the edit itself is saved.
        logger.error({ err, rigId }, 'could not queue a margin check');
      }
    },
    async retryMail(mail) {
      // A link in an account e-mail is single-use and short-lived: no attachments, small JSON.
      await boss.send(QUEUES.mailRetry, { mail }, { startAfter: config.JOB_RETRY_DELAY_SECONDS });
    },
    async queueMail(mail) {
      await boss.send(QUEUES.mailRetry, { mail });
    },
    async noteWritten(rigId, recipients) {
      for (const userId of recipients) {
        try {
          await boss.send(QUEUES.noteDigest, { rigId, userId }, { singletonKey: `${userId}:${rigId}`, startAfter: config.NOTE_EMAIL_GATHER_SECONDS });
        } catch (err) {
          logger.error({ err, rigId, userId }, 'could not queue a note e-mail');
        }
      }
    },
  };
  return jobs;
}
