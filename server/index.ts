import { createApp } from './app';
import { createContext } from './context';
import { migrateAll } from './migrate';

async function main() {
  const ctx = createContext();
  const { config, logger, db, auth, jobs } = ctx;
  const applied = await migrateAll(auth, db);
  if (applied.length) logger.info({ applied }, 'migrations applied');
  await jobs.start();
  logger.info({ workers: config.RUN_WORKERS }, 'job queue started');

  const app = createApp(ctx);
  const server = app.listen(config.PORT, config.HOST, () => {
    logger.info(`Keyoff listening on http://${config.HOST}:${config.PORT}`);
  });
  server.on('error', (err) => {
    logger.fatal({ err }, 'could not listen');
    process.exit(1);
  });

  let stopping = false;
  const shutdown = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down');
    const force = setTimeout(() => process.exit(1), 10_000) as unknown as NodeJS.Timeout;
    force.unref();
    server.close(async () => {
      await jobs.stop().catch((err) => logger.error({ err }, 'job queue did not stop cleanly'));
      await db.destroy();
      clearTimeout(force);
      process.exit(0);
    });
    server.closeIdleConnections();
  };
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));
}

main().catch((err) => {
  console.error('Keyoff could not start:', err instanceof Error ? err.message : err);
  process.exit(1);
});
