import { pino } from 'pino';

import { createDb } from '@/db/client';
import { migrateToLatest } from '@/db/migrator';
import { createApp } from './app';
import { loadConfig } from './config';

async function main() {
const config = loadConfig();
const logger = pino({ level: config.LOG_LEVEL });
const db = createDb(config.DATABASE_URL);

const applied = await migrateToLatest(db);
if (applied.length) logger.info({ applied }, 'migrations applied');

const app = createApp({ config, db, logger });
const server = app.listen(config.PORT, config.HOST, () => {
  logger.info(`Keyoff listening on http://${config.HOST}:${config.PORT}`);
});
server.on('error', (err) => {
  logger.fatal({ err }, 'could not listen');
  process.exit(1);
});

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'shutting down');
  const force = setTimeout(() => process.exit(1), 10_000) as unknown as NodeJS.Timeout;
  force.unref();
  server.close(async () => {
    await db.destroy();
    clearTimeout(force);
    process.exit(0);
  });
  server.closeIdleConnections();
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
}

main().catch((err) => {
  console.error('Keyoff could not start:', err instanceof Error ? err.message : err);
  process.exit(1);
});
