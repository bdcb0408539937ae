import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import { createDb } from '@/db/client';
import { createContext } from '@/server/context';
import { pino } from 'pino';
import { withTestApp } from './fixtures';

const ctx = withTestApp();

describe('GET /api/health', () => {
  it('reports the database connected', async () => {
    const res = await request(ctx.app).get('/api/health').expect(200);
    expect(res.body.status).toBe('ok');
    expect(res.body.database.connected).toBe(true);
    expect(typeof res.body.database.latencyMs).toBe('number');
  });

  it('reports a database that cannot be reached as degraded, with 503', async () => {
    const config = loadConfig({ NODE_ENV: 'test', SERVE_WEB: 'false' });
    const db = createDb('postgres://keyoff@127.0.0.1:1/none', 1);
    const app = createApp(createContext(process.env, { config, db, logger: pino({ level: 'silent' }) }));
    const res = await request(app).get('/api/health').expect(503);
    expect(res.body.status).toBe('degraded');
    expect(res.body.database.connected).toBe(false);
    await db.destroy();
  });
});

describe('errors', () => {
  it('answers an unknown API path with problem-style JSON 404', async () => {
    const res = await request(ctx.app).get('/api/no-such-thing').expect(404);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body).toMatchObject({ status: 404, code: 'not_found' });
  });

  it('answers a body that is not JSON with 400, not 500', async () => {
    const res = await request(ctx.app).post('/api/projections').set('Content-Type', 'application/json').send('{"battery": ');
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('bad_request');
  });

  it('sets security headers', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  });
});

describe('the seeded demo scenario', () => {
  it('holds the rigs Wren and Stoat with their loads, once each, in the demo household', async () => {
    const rows = await ctx.db
      .selectFrom('rigs')
      .leftJoin('loads', 'loads.rig_id', 'rigs.id')
      .select(['rigs.name', (eb) => eb.fn.count<string>('loads.id').as('loads')])
      .where('rigs.seed_key', 'in', ['demo-wren', 'demo-stoat'])
      .groupBy('rigs.name')
      .orderBy('rigs.name')
      .execute();
    expect(rows.map((r) => [r.name, Number(r.loads)])).toEqual([
      ['Stoat', 2],
      ['Wren', 6],
    ]);
  });
});
