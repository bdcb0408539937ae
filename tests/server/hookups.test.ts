import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';

const { ctx, fx } = withHousehold();

const post = (body: unknown) => request(ctx.app).post('/api/hookups').send(body as object);
const paths = (res: request.Response) => (res.body.fields as { path: string }[]).map((f) => f.path);
const power = { systemVoltage: 12, battery: { chemistry: 'agm', capacityAh: 100 }, inverter: { ratedW: 1000, efficiencyPercent: 90, control: 'ignition-relay' } };

describe('POST /api/hookups', () => {
  it('answers the feed, the rated parts, the warnings and the cautions', async () => {
    const res = await post({ ...power, feedLengthM: 2 }).expect(200);
    // 1000 W / (10.5 V × 0.9) = 105.82 A (REFERENCES, Inverters); 150 A protection (NEC 210.20(A), 240.6(A));
    // 2 AWG at 2.25 % (NEC Table 8) — the same hand-worked plan as tests/shared/energy/hookup.test.ts.
    expect(res.body).toMatchObject({ control: 'ignition-relay', connection: 'direct', feed: { currentA: 105.82, awg: '2', fuseA: 150 } });
    expect(res.body.parts.map((p: { kind: string }) => p.kind)).toEqual(['battery', 'protection', 'coil-fuse', 'relay', 'conductor', 'inverter', 'return']);
    expect(res.body.cautions.join(' ')).toMatch(/qualified auto electrician/);
  });

  it('refuses bad input with 400, naming the fields', async () => {
    const res = await post({ ...power, feedLengthM: 0, inverter: { ...power.inverter, ratedW: -5, connection: 'usb' } }).expect(400);
    expect(paths(res)).toEqual(expect.arrayContaining(['feedLengthM', 'inverter.ratedW', 'inverter.connection']));
  });

  it('refuses a power system without an inverter', async () => {
    expect(paths(await post({ ...power, inverter: null }).expect(400))).toContain('inverter');
  });
});

describe('POST /api/projections with a plug-in inverter', () => {
  it('warns with a socket code when the AC loads exceed the socket fuse', async () => {
    const res = await request(ctx.app)
      .post('/api/projections')
      .send({ ...power, inverter: { ratedW: 300, connection: 'socket', socketFuseA: 10 }, loads: [{ name: 'Blender', supply: 'ac', watts: 200, hoursPerDay: 1, startHour: 9 }] })
      .expect(200);
    // 200 W / (12 V × 0.9) + 0.5 A idle = 19 A through a 10 A fuse.
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toContain('socket-fuse-exceeded');
  });

  it('refuses a socket fuse above 40 A', async () => {
    const res = await request(ctx.app).post('/api/projections').send({ ...power, inverter: { ratedW: 300, connection: 'socket', socketFuseA: 60 } }).expect(400);
    expect(paths(res)).toContain('inverter.socketFuseA');
  });
});

describe('GET /api/rigs/:rigId/hookup', () => {
  it('plans the saved rig, and as a Fix would change it', async () => {
    const now = await fx.agents.member.get(`/api/rigs/${fx.rigId}/hookup`).expect(200);
    expect(now.body).toMatchObject({ rigId: fx.rigId, control: 'always-on', connection: 'direct' });
    expect(now.body.warnings.map((w: { code: string }) => w.code)).toContain('no-switch');
    const fix = await fx.agents.advisor.get(`/api/rigs/${fx.rigId}/hookup`).query({ control: 'ignition-relay' }).expect(200);
    // 300 W / 9.45 = 31.75 A; × 1.25 = 39.7 A: a 40 A fuse and a 40 A relay (common practice).
    expect(fix.body.feed.fuseA).toBe(40);
    expect(fix.body.parts.find((p: { kind: string }) => p.kind === 'relay').ratingA).toBe(40);
  });

  it('takes the length of the rig\'s saved inverter feed', async () => {
    const run = await fx.agents.owner
      .post(`/api/rigs/${fx.rigId}/cable-runs`)
      
      .send({ label: 'Inverter feed', lengthM: 3.5, currentA: 32, maxDropPercent: 3, cableType: 'marine', purpose: 'inverter', continuous: true })
      .expect(201);
    const res = await fx.agents.owner.get(`/api/rigs/${fx.rigId}/hookup`).expect(200);
    expect(res.body.feed.lengthM).toBe(3.5);
    expect(res.body.feedRun.id).toBe(run.body.id);
  });

  it('refuses a bad query, naming the field', async () => {
    const res = await fx.agents.owner.get(`/api/rigs/${fx.rigId}/hookup`).query({ control: 'sometimes', feedLengthM: 'long' }).expect(400);
    expect(paths(res)).toEqual(expect.arrayContaining(['control', 'feedLengthM']));
  });
});
