import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { signIn, verifiedUser } from './helpers';
import { makeTestApp, TEST_ORIGIN } from './test-app';

let ctx: Awaited<ReturnType<typeof makeTestApp>>;
let agent: Awaited<ReturnType<typeof signIn>>;
let other: Awaited<ReturnType<typeof signIn>>;
beforeAll(async () => {
  ctx = await makeTestApp();
  agent = await signIn(ctx.app, (await verifiedUser(ctx, 'units-person')).email);
  other = await signIn(ctx.app, (await verifiedUser(ctx, 'units-other')).email);
});
afterAll(async () => {
  await ctx.jobs.stop();
  await ctx.db.destroy();
});

describe('the energy unit on the account', () => {
  it('is amp-hours, not yet chosen, for a new account; GET /api/me carries it', async () => {
    expect((await agent.get('/api/me').expect(200)).body.units).toEqual({ energy: 'Ah', saved: false });
  });

  it('keeps a choice of Wh for that account only', async () => {
    expect((await agent.put('/api/me/units').set('Origin', TEST_ORIGIN).send({ energy: 'Wh' }).expect(200)).body).toEqual({ energy: 'Wh', saved: true });
    expect((await agent.get('/api/me').expect(200)).body.units).toEqual({ energy: 'Wh', saved: true });
    expect((await other.get('/api/me').expect(200)).body.units).toEqual({ energy: 'Ah', saved: false });
    await agent.put('/api/me/units').set('Origin', TEST_ORIGIN).send({ energy: 'Ah' }).expect(200);
    expect((await agent.get('/api/me').expect(200)).body.units).toEqual({ energy: 'Ah', saved: true });
  });

  it('refuses anything but Ah or Wh with a 400 naming the field, and keeps the unit as it was', async () => {
    await agent.put('/api/me/units').set('Origin', TEST_ORIGIN).send({ energy: 'Wh' }).expect(200);
    for (const body of [{ energy: 'kWh' }, { energy: 'wh' }, { energy: null }, {}, { energy: ['Wh'] }]) {
      const res = await agent.put('/api/me/units').set('Origin', TEST_ORIGIN).send(body).expect(400);
      expect(res.body.fields).toEqual([{ path: 'energy', message: 'Choose Ah or Wh.' }]);
    }
    const extra = await agent.put('/api/me/units').set('Origin', TEST_ORIGIN).send({ energy: 'Ah', power: 'A' }).expect(400);
    expect(extra.body.fields.map((f: { path: string }) => f.path)).toEqual(['power']);
    expect((await agent.get('/api/me').expect(200)).body.units).toEqual({ energy: 'Wh', saved: true });
  });

  it('is for signed-in people only', async () => {
    await request(ctx.app).put('/api/me/units').set('Origin', TEST_ORIGIN).send({ energy: 'Wh' }).expect(401);
  });
});
