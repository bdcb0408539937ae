import { Router } from 'express';
import { sql } from 'kysely';

import type { Db } from '@/db/client';
import { type Health, healthSchema } from '@/shared/api/health';
import { handler } from '../http/handler';

const started = Date.now();

export function healthRouter(db: Db, version: string) {
  const router = Router();
  router.get('/', handler({ response: healthSchema }, async ({ res }) => {
    const t0 = performance.now();
    let database: Health['database'];
    try {
      await sql`select 1`.execute(db);
      database = { connected: true, latencyMs: Math.round((performance.now() - t0) * 10) / 10 };
    } catch (err) {
      database = { connected: false, latencyMs: null, error: err instanceof Error ? err.message : 'unreachable' };
    }
    const body: Health = {
      status: database.connected ? 'ok' : 'degraded',
      database,
      version,
      uptimeS: Math.round((Date.now() - started) / 1000),
    };
    res.status(database.connected ? 200 : 503);
    return body;
  }));
  return router;
}
