import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { createConnection } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import sharp from 'sharp';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';

import { restingLog } from '../shared/energy/fixtures';
import { withHousehold } from './fixtures';
import { agentFor } from './helpers';
import { makeTestApp } from './test-app';

const { ctx, fx } = withHousehold({ env: { SIGNED_URL_SECONDS: '2' } });
beforeAll(async () => {
  // The fixture van as a 100 Ah flooded battery, for the BCI table.
  const rig = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
  await fx.agents.owner.patch(`/api/rigs/${fx.rigId}`).send({ version: rig.version, power: { ...rig.power, battery: { ...rig.power.battery, chemistry: 'flooded' } } }).expect(200);
});

const csvOf = (rows: { at: string; voltageV: number }[]) => Buffer.from(['Timestamp,Battery (V),Notes', ...rows.map((r) => `${r.at},${r.voltageV},`)].join('\n'));
const MAPPING = JSON.stringify({ time: 'Timestamp', voltage: 'Battery (V)' });
const rowsOfRig = async () => Number((await ctx.db.selectFrom('readings').select((eb) => eb.fn.countAll().as('n')).where('rig_id', '=', fx.rigId).executeTakeFirstOrThrow()).n);
const uploadsOfRig = async () => (await ctx.db.selectFrom('uploads').select('id').where('rig_id', '=', fx.rigId).execute()).length;
const s3 = new S3Client({ endpoint: 'http://127.0.0.1:4569', region: 'us-east-1', forcePathStyle: true, credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } });
const objectsOfRig = async () => (await s3.send(new ListObjectsV2Command({ Bucket: 'keyoff', Prefix: `rigs/${fx.rigId}/` }))).KeyCount ?? 0;
const upload = (agent: typeof fx.agents.owner, file: Buffer, name: string, fields: Record<string, string> = { mapping: MAPPING }) => {
  let req = agent.post(`/api/rigs/${fx.rigId}/uploads`);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', file, name);
};

describe('spot readings', () => {
  it('takes a typed reading from a member, refuses one from the advisor, and names a wrong field', async () => {
    await fx.agents.member.post(`/api/rigs/${fx.rigId}/readings`).send({ at: '2026-11-19T08:00:00Z', voltageV: 12.52, rested: true, place: 'terminals', note: 'Morning, before the fridge.' }).expect(201);
    await fx.agents.advisor.post(`/api/rigs/${fx.rigId}/readings`).send({ at: '2026-11-19T08:00:00Z', voltageV: 12.5 }).expect(403);
    const bad = await fx.agents.member.post(`/api/rigs/${fx.rigId}/readings`).send({ at: 'yesterday', voltageV: 120 }).expect(400);
    expect(bad.body.fields.map((f: { path: string }) => f.path).sort()).toEqual(['at', 'voltageV']);
    const list = (await fx.agents.advisor.get(`/api/rigs/${fx.rigId}/readings`).expect(200)).body;
    // 12.52 V rested on the BCI table: between 12.45 V (75 %) and 12.65 V (100 %): 75 + 25 × 0.07 / 0.20 = 83.75 %.
    expect(list.spot[0]).toMatchObject({ voltageV: 12.52, rested: true, note: 'Morning, before the fridge.' });
    expect(list.spot[0].socPercent).toBeCloseTo(83.75, 0);
  });
});

describe('CSV log uploads', () => {
  it('stores the good rows and lists the bad ones by line; all-or-nothing stores nothing', async () => {
    const good = restingLog(3);
    const file = Buffer.from(['Timestamp,Battery (V)', `${good[0].at},12.6`, 'not a time,12.5', `${good[1].at},twelve`, '', `${good[2].at},12.55`].join('\n'));
    const before = await rowsOfRig();
    const all = await upload(fx.agents.member, file, 'mixed.csv', { mapping: MAPPING, allOrNothing: 'true' }).expect(422);
    expect(all.body.fields).toEqual([
      { path: 'line 3', message: 'time "not a time" is not a date and time' },
      { path: 'line 4', message: 'voltage "twelve" is not a number from 0 to 80' },
    ]);
    expect(await rowsOfRig()).toBe(before);
    const some = await upload(fx.agents.member, file, 'mixed.csv').expect(201);
    expect(some.body.upload).toMatchObject({ rowCount: 2, errorCount: 2, fileName: 'mixed.csv' });
    expect(some.body.errors.map((e: { line: number }) => e.line)).toEqual([3, 4]);
    expect(await rowsOfRig()).toBe(before + 2);
  });

  it('refuses an empty file, a header alone and a wrong column name, naming what is wrong', async () => {
    expect((await upload(fx.agents.owner, Buffer.from(''), 'empty.csv').expect(400)).body.message).toBe('The file is empty.');
    expect((await upload(fx.agents.owner, Buffer.from('Timestamp,Battery (V)\n'), 'header.csv').expect(400)).body.message).toBe('The file has a header row but no readings.');
    const wrong = await upload(fx.agents.owner, csvOf(restingLog(2)), 'log.csv', { mapping: JSON.stringify({ time: 'When', voltage: 'Battery (V)' }) }).expect(400);
    expect(wrong.body.fields[0].path).toBe('mapping.time');
    expect((await upload(fx.agents.owner, csvOf(restingLog(2)), 'log.csv', { mapping: '{' }).expect(400)).body.fields[0].path).toBe('mapping');
  });

  it('answers 413 for 10 MB and one byte, and keeps neither a row nor an object', async () => {
    const [rows, objects] = [await rowsOfRig(), await objectsOfRig()];
    const big = Buffer.alloc(10 * 1024 * 1024 + 1, 'a');
    const res = await upload(fx.agents.owner, big, 'big.csv').expect(413);
    expect(res.body.fields[0].path).toBe('file');
    expect([await rowsOfRig(), await objectsOfRig()]).toEqual([rows, objects]);
  });

  it('tells a PNG renamed .csv and a CSV renamed .png by their bytes (415)', async () => {
    const png = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#17324A' } }).png().toBuffer();
    expect((await upload(fx.agents.owner, png, 'log.csv').expect(415)).body.message).toMatch(/PNG/);
    const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/photos`).attach('file', csvOf(restingLog(2)), 'wiring.png').expect(415);
    expect(res.body.fields[0].path).toBe('file');
  });

  it('estimates the drain roughly from a generated resting log and charts it with the model', async () => {
    await upload(fx.agents.owner, csvOf(restingLog(50)), 'resting.csv', { mapping: MAPPING, rested: 'true' }).expect(201);
    const { analysis, chart } = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}/readings`).expect(200)).body;
    // 12.65 V to 12.45 V on 100 Ah (BCI): 25 Ah in 50 h = 0.5 A, a rough estimate with its range.
    expect(analysis.method).toBe('voltage');
    expect(Math.abs(analysis.drainA - 0.5) / 0.5).toBeLessThan(0.1);
    expect(analysis.rangeA[0]).toBeLessThan(0.5);
    expect(analysis.comparison.message).toMatch(/rough estimate/);
    expect(chart.points.length).toBeGreaterThan(50);
    expect(chart.model.length).toBeGreaterThan(10);
  });
});

describe('install photos', () => {
  it('keeps a JPEG with a thumbnail; an outsider gets 404, the advisor a signed address that expires', async () => {
    const jpeg = await sharp({ create: { width: 1200, height: 900, channels: 3, background: '#B9831A' } }).jpeg().toBuffer();
    const made = await fx.agents.member.post(`/api/rigs/${fx.rigId}/photos`).field('caption', 'Fuse block by the battery').attach('file', jpeg, '../../etc/Fuse block?.jpg').expect(201);
    await fx.agents.outsider.get(`/api/rigs/${fx.rigId}/photos/${made.body.id}`).expect(404);
    const seen = await fx.agents.advisor.get(`/api/rigs/${fx.rigId}/photos/${made.body.id}`).expect(200);
    expect(seen.body.fileName).toBe('Fuse block.jpg');
    const got = await fetch(seen.body.url);
    expect(got.status).toBe(200);
    expect(got.headers.get('content-type')).toBe('image/jpeg');
    const thumb = Buffer.from(await (await fetch(seen.body.thumbUrl)).arrayBuffer());
    expect((await sharp(thumb).metadata()).width).toBe(480);
    await new Promise((r) => setTimeout(r, 3000));
    expect((await fetch(seen.body.url)).status).toBe(403);
  });

  it('refuses a HEIC photo with what to do instead', async () => {
    // The start of an HEIF file: a 'ftyp' box with the 'heic' brand (ISO/IEC 23008-12).
    const heic = Buffer.concat([Buffer.from([0, 0, 0, 24]), Buffer.from('ftypheic'), Buffer.from([0, 0, 0, 0]), Buffer.from('mif1heic'), Buffer.alloc(64)]);
    const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/photos`).attach('file', heic, 'IMG_0001.HEIC').expect(415);
    expect(res.body.message).toMatch(/HEIC .*JPEG/);
  });
});

describe('when object storage is down', () => {
  it('answers 503 and leaves neither a row nor an object behind', async () => {
    const port = 4579;
    const down = await makeTestApp({ S3_ENDPOINT: `http://127.0.0.1:${port}` });
    const agent = agentFor(down.app);
    await agent.post('/api/auth/sign-in/email').send({ email: fx.users.owner.email, password: 'a-long-test-password' }).expect(200);
    const rows = await rowsOfRig();
    const uploads = await uploadsOfRig();
    const res = await agent.post(`/api/rigs/${fx.rigId}/uploads`).field('mapping', MAPPING).attach('file', csvOf(restingLog(5)), 'log.csv').expect(503);
    expect(res.body.code).toBe('storage_unavailable');
    // Storage comes back: the same upload goes through, and only then is there an object.
    const dir = mkdtempSync(path.join(tmpdir(), 'keyoff-s3-'));
    const s3rver: ChildProcess = spawn('node_modules/.bin/s3rver', ['-d', dir, '-a', '127.0.0.1', '-p', String(port), '--configure-bucket', 'keyoff', '--silent'], { stdio: 'ignore' });
    try {
      for (let i = 0; i < 100 && !(await new Promise<boolean>((r) => createConnection({ host: '127.0.0.1', port }, function (this: import('node:net').Socket) { this.destroy(); r(true); }).on('error', () => r(false)))); i++) await new Promise((r) => setTimeout(r, 100));
      expect([await rowsOfRig(), await uploadsOfRig()]).toEqual([rows, uploads]);
      await agent.post(`/api/rigs/${fx.rigId}/uploads`).field('mapping', MAPPING).attach('file', csvOf(restingLog(5)), 'log.csv').expect(201);
    } finally {
      s3rver.kill('SIGTERM');
      await down.jobs.stop();
      await down.db.destroy();
    }
  });
});

describe('POST /api/readings/analyze (open, stores nothing)', () => {
  it('answers the state of charge of each reading, the drain and the hours', async () => {
    const res = await request(ctx.app).post('/api/readings/analyze').send({ chemistry: 'flooded', capacityAh: 100, readings: restingLog(50) }).expect(200);
    expect(res.body.readings[0]).toEqual({ at: '2026-11-20T18:00:00.000Z', socPercent: 100, source: 'voltage' });
    expect(res.body.hours).toBe(50);
    expect(res.body.spans).toBeUndefined();
    expect(Math.abs(res.body.drainA - 0.5) / 0.5).toBeLessThan(0.1);
    // The battery you have: 80 % health at 0 °C (75 %, US Army TM 10-6140-200-14) leaves 60 Ah usable: 25 points of it in 50 h = 0.3 A.
    const worn = await request(ctx.app).post('/api/readings/analyze').send({ chemistry: 'flooded', capacityAh: 100, healthPercent: 80, temperatureC: 0, readings: restingLog(50) }).expect(200);
    expect(worn.body).toMatchObject({ usableAh: 60, drainA: 0.3, method: 'voltage' });
    const lfp = await request(ctx.app).post('/api/readings/analyze').send({ chemistry: 'lifepo4', capacityAh: 100, readings: restingLog(5) }).expect(200);
    expect(lfp.body.drainA).toBeNull();
    expect(lfp.body.reason).toMatch(/battery monitor/);
    const bad = await request(ctx.app).post('/api/readings/analyze').send({ chemistry: 'lead', capacityAh: -1, readings: [] }).expect(400);
    expect(bad.body.fields.map((f: { path: string }) => f.path).sort()).toEqual(['capacityAh', 'chemistry', 'readings']);
  });
});
