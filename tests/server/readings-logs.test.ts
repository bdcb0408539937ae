import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { sql } from 'kysely';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';
import { WREN_POWER } from './helpers';

const { ctx, fx } = withHousehold();

type Agent = typeof fx.agents.owner;
/** A rig of its own for each case, in the fixture's household: a 100 Ah flooded battery, no inverter unless given. */
async function freshRig(extra: Record<string, unknown> = {}, loads: unknown[] = []) {
  const res = await fx.agents.owner.post('/api/rigs').send({ name: 'Readings van', householdId: fx.householdId, power: { ...WREN_POWER, inverter: null, battery: { chemistry: 'flooded', capacityAh: 100 }, ...extra }, loads });
  expect(res.status).toBe(201);
  return res.body.id as string;
}
const upload = (agent: Agent, rigId: string, text: string, mapping: Record<string, unknown>, extra: Record<string, string> = {}) => {
  let req = agent.post(`/api/rigs/${rigId}/uploads`).field('mapping', JSON.stringify(mapping));
  for (const [k, v] of Object.entries(extra)) req = req.field(k, v);
  return req.attach('file', Buffer.from(text), 'log.csv');
};
const rowsOf = async (rigId: string) => (await ctx.db.selectFrom('readings').select(['at', 'voltage_v', 'current_a', 'rested']).where('rig_id', '=', rigId).orderBy('at').execute());
const s3 = new S3Client({ endpoint: 'http://127.0.0.1:4569', region: 'us-east-1', forcePathStyle: true, credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } });
const objectsOf = async (rigId: string) => ((await s3.send(new ListObjectsV2Command({ Bucket: 'keyoff', Prefix: `rigs/${rigId}/` }))).Contents ?? []).map((o) => o.Key);
const historyOf = async (rigId: string) => (await fx.agents.owner.get(`/api/rigs/${rigId}/history`).expect(200)).body.history as { kind: string; summary: string }[];

describe('typed readings', () => {
  it('refuses a reading marked rested with 0.8 A flowing, naming the field, and takes it unrested', async () => {
    const rigId = await freshRig();
    const res = await fx.agents.member.post(`/api/rigs/${rigId}/readings`).send({ at: '2026-11-20T10:00:00Z', voltageV: 12.55, currentA: 0.8, rested: true }).expect(400);
    // A trickle is C/1000 (model choice): 0.1 A on 100 Ah.
    expect(res.body.fields[0]).toMatchObject({ path: 'rested' });
    expect(res.body.fields[0].message).toMatch(/0.8 A was flowing.*0.1 A/);
    await fx.agents.member.post(`/api/rigs/${rigId}/readings`).send({ at: '2026-11-20T08:00:00Z', voltageV: 12.71, rested: true }).expect(201);
    await fx.agents.member.post(`/api/rigs/${rigId}/readings`).send({ at: '2026-11-20T10:00:00Z', voltageV: 12.55, currentA: 0.8, rested: false }).expect(201);
    const { analysis } = (await fx.agents.owner.get(`/api/rigs/${rigId}/readings`).expect(200)).body;
    // The measured 0.8 A over the 2 hours, not 6.2 A from the fall in voltage.
    expect(analysis).toMatchObject({ method: 'current', drainA: 0.8, hours: 2 });
    expect(analysis.comparison).toMatchObject({ enough: false, quietHours: 2, neededHours: 24 });
    expect(analysis.comparison.message).toMatch(/22 more needed/);
    expect((await historyOf(rigId)).filter((h) => h.kind === 'reading-added')).toHaveLength(2);
  });
});

describe('CSV logs as people have them', () => {
  it('reads a semicolon log with decimal commas and times in the uploader’s zone', async () => {
    const rigId = await freshRig();
    const text = ['Zeit;Spannung (V);Strom (A)', '20.11.2026 19:00;12,65;0,45', '20.11.2026 20:00;12,61;0,45', '20.11.2026 21:00;12,58;0,5'].join('\r\n');
    const preview = (await fx.agents.owner.post(`/api/rigs/${rigId}/uploads/preview`).attach('file', Buffer.from(text), 'log.csv').expect(200)).body;
    expect(preview).toMatchObject({ delimiter: ';', decimalComma: true, rows: 3, columns: ['Zeit', 'Spannung (V)', 'Strom (A)'] });
    expect(preview.mapping).toMatchObject({ time: 'Zeit', voltage: 'Spannung (V)', current: 'Strom (A)', decimalComma: true });
    const wrong = await upload(fx.agents.owner, rigId, text, { ...preview.mapping, decimalComma: false }).expect(422);
    expect(wrong.body.fields[0]).toEqual({ path: 'line 2', message: 'voltage "12,65" is not a number from 0 to 80; current "0,45" is not a number from -1000 to 1000; numbers with a decimal comma? say so at mapping' });
    await upload(fx.agents.owner, rigId, text, preview.mapping, { timeZone: 'Europe/Berlin' }).expect(201);
    const rows = await rowsOf(rigId);
    // 19:00 in Berlin in November (CET, UTC+1) is 18:00 UTC.
    expect(rows.map((r) => [new Date(r.at as unknown as Date).toISOString(), r.voltage_v, r.current_a])).toEqual([
      ['2026-11-20T18:00:00.000Z', 12.65, 0.45],
      ['2026-11-20T19:00:00.000Z', 12.61, 0.45],
      ['2026-11-20T20:00:00.000Z', 12.58, 0.5],
    ]);
    // Trapezoids: (0.45 + 0.45) / 2 × 1 h + (0.45 + 0.5) / 2 × 1 h = 0.925 Ah in 2 h = 0.4625 A, 0.46 A to two figures.
    const { analysis } = (await fx.agents.owner.get(`/api/rigs/${rigId}/readings`).expect(200)).body;
    expect(analysis).toMatchObject({ method: 'current', drainA: 0.46 });
    // The mapping is remembered for the next log.
    const again = (await fx.agents.owner.post(`/api/rigs/${rigId}/uploads/preview`).attach('file', Buffer.from(text), 'log.csv').expect(200)).body;
    expect(again).toMatchObject({ remembered: true, mapping: { decimalComma: true, currentSign: 'drawn-positive' } });
  });

  it('turns a log that counts discharge as negative round, as chosen at mapping; a tab log reads too', async () => {
    const rigId = await freshRig();
    const text = ['time\tvolts\tamps', '2026-11-20T18:00:00Z\t12.6\t-0.6', '2026-11-20T19:00:00Z\t12.58\t-0.6', '2026-11-20T20:00:00Z\t13.9\t12.0'].join('\n');
    const res = await upload(fx.agents.member, rigId, text, { time: 'time', voltage: 'volts', current: 'amps', currentSign: 'drawn-negative' }).expect(201);
    expect(res.body.upload.rowCount).toBe(3);
    expect((await rowsOf(rigId)).map((r) => r.current_a)).toEqual([0.6, 0.6, -12]);
    // The charging hour (12 A into the battery) is not quiet: 0.6 A over the one quiet hour.
    const { analysis } = (await fx.agents.owner.get(`/api/rigs/${rigId}/readings`).expect(200)).body;
    expect(analysis).toMatchObject({ method: 'current', drainA: 0.6, hours: 1 });
  });

  it('marks rows of a "rested" log that carry more than a trickle as not rested, and says so', async () => {
    const rigId = await freshRig();
    const text = ['time,volts,amps', '2026-11-20T18:00:00Z,12.6,0.02', '2026-11-20T19:00:00Z,12.58,0.9', '2026-11-20T20:00:00Z,12.57,0.03'].join('\n');
    const res = await upload(fx.agents.owner, rigId, text, { time: 'time', voltage: 'volts', current: 'amps' }, { rested: 'true' }).expect(201);
    expect(res.body.notes[0]).toMatch(/^1 rows marked rested carried more than a trickle/);
    expect((await rowsOf(rigId)).map((r) => r.rested)).toEqual([true, false, true]);
  });
});

describe('the chart of a view', () => {
  it('averages a 3,000-row log in the database into 1,000 points of three rows each', async () => {
    const rigId = await freshRig();
    // One row a minute for 2,999 minutes: buckets of ceil(179,940 s / 1,000) = 180 s hold three rows each;
    // the voltages repeat 12.0, 12.3, 12.6, so every point's mean is 12.3 V and its time the middle row's.
    const t0 = Date.parse('2026-11-20T00:00:00Z');
    const text = ['time,volts', ...Array.from({ length: 3000 }, (_, i) => `${new Date(t0 + i * 60_000).toISOString()},${(12 + (i % 3) * 0.3).toFixed(1)}`)].join('\n');
    await upload(fx.agents.owner, rigId, text, { time: 'time', voltage: 'volts' }).expect(201);
    const { chart, total } = (await fx.agents.owner.get(`/api/rigs/${rigId}/readings`).expect(200)).body;
    expect(total).toBe(3000);
    expect(chart.points).toHaveLength(1000);
    expect(chart.points.every((p: { voltageV: number; n: number }) => p.voltageV === 12.3 && p.n === 3)).toBe(true);
    expect(chart.points[1].at).toBe('2026-11-20T00:04:00.000Z');
  });

  it('draws the model from the first known charge, aligned to the local hours its schedule describes', async () => {
    // A 12 W DC lamp (1 A at 12 V) from 14:00 to 15:00 local time, Asia/Kolkata (UTC+5:30).
    const rigId = await freshRig({}, [{ name: 'Lamp', supply: 'dc', watts: 12, hoursPerDay: 1, startHour: 14 }]);
    // 08:10 UTC is 13:40 in Kolkata: the model starts at the local hour 13:00 (07:30 UTC), so its points fall at :30 UTC.
    const readings = [{ at: '2026-11-20T08:10:00Z', voltageV: 12.65 }, { at: '2026-11-20T12:10:00Z', voltageV: 12.6 }];
    for (const r of readings) await fx.agents.owner.post(`/api/rigs/${rigId}/readings`).send({ ...r, rested: true }).expect(201);
    const { chart } = (await fx.agents.owner.get(`/api/rigs/${rigId}/readings?timeZone=Asia/Kolkata`).expect(200)).body;
    const model = chart.model as { at: string; socPercent: number }[];
    expect(model[0]).toEqual({ at: '2026-11-20T08:10:00.000Z', socPercent: 100 });
    expect(model.slice(1, 4).map((p) => p.at)).toEqual(['2026-11-20T08:30:00.000Z', '2026-11-20T09:30:00.000Z', '2026-11-20T10:30:00.000Z']);
    // The lamp's hour, 14:00 to 15:00 local (08:30 to 09:30 UTC), takes 1 Ah = 1 point of 100 Ah more than the hours around it.
    const drop = (i: number) => model[i].socPercent - model[i + 1].socPercent;
    expect(drop(1) - drop(2)).toBeCloseTo(1, 1);
    await fx.agents.owner.get(`/api/rigs/${rigId}/readings?timeZone=Mars/Olympus`).expect(400);
  });
});

describe('deleting what is wrong', () => {
  it('removes a log with its rows and object and a photo with its objects; only who added it or the owner may', async () => {
    const rigId = await freshRig();
    const log = (await upload(fx.agents.member, rigId, 'time,volts\n2026-11-20T18:00:00Z,12.6\n2026-11-20T19:00:00Z,12.58\n', { time: 'time', voltage: 'volts' }).expect(201)).body.upload.id;
    const jpeg = await sharp({ create: { width: 600, height: 400, channels: 3, background: '#B9831A' } }).jpeg().toBuffer();
    const photo = (await fx.agents.owner.post(`/api/rigs/${rigId}/photos`).attach('file', jpeg, 'fuse.jpg').expect(201)).body.id;
    await fx.agents.member.post(`/api/rigs/${rigId}/readings`).send({ at: '2026-11-20T08:00:00Z', voltageV: 12.5 }).expect(201);
    const typed = (await fx.agents.owner.get(`/api/rigs/${rigId}/readings`).expect(200)).body.spot[0];
    expect(typed.canDelete).toBe(true);
    expect(await objectsOf(rigId)).toHaveLength(3);

    // The member may not delete the owner's photo; the owner may delete the member's log and reading.
    await fx.agents.member.delete(`/api/rigs/${rigId}/photos/${photo}`).expect(403);
    await fx.agents.member.delete(`/api/rigs/${rigId}/uploads/${photo}`).expect(404);
    await fx.agents.owner.delete(`/api/rigs/${rigId}/uploads/${log}`).expect(204);
    await fx.agents.owner.delete(`/api/rigs/${rigId}/readings/${typed.id}`).expect(204);
    expect(await rowsOf(rigId)).toHaveLength(0);
    expect((await objectsOf(rigId)).filter((k) => k!.includes('/logs/'))).toHaveLength(0);
    await fx.agents.owner.delete(`/api/rigs/${rigId}/photos/${photo}`).expect(204);
    expect(await objectsOf(rigId)).toHaveLength(0);
    const removed = (await historyOf(rigId)).filter((h) => h.kind === 'reading-removed').map((h) => h.summary);
    expect(removed).toEqual(['deleted the photo fuse.jpg', 'deleted a reading: 12.5 V at 2026-11-20 08:00 UTC', 'deleted the log log.csv (2 readings)']);
  });
});

describe('bounded work', () => {
  it('keeps at most 250,000 readings a rig: a log that would pass it is refused whole', async () => {
    const rigId = await freshRig();
    await sql`insert into readings (rig_id, at, voltage_v, created_at) select ${rigId}, timestamptz '2026-01-01' + g * interval '1 minute', 12.6, now() from generate_series(1, 249999) g`.execute(ctx.db);
    const res = await upload(fx.agents.owner, rigId, 'time,volts\n2026-11-20T18:00:00Z,12.6\n2026-11-20T19:00:00Z,12.58\n', { time: 'time', voltage: 'volts' }).expect(413);
    expect(res.body.message).toMatch(/at most 250,000 readings; it has 249,999 and this log adds 2/);
    expect((await objectsOf(rigId)).length).toBe(0);
    // The view reads aggregates only: a bounded answer however long the record.
    const view = (await fx.agents.owner.get(`/api/rigs/${rigId}/readings`).expect(200)).body;
    expect(view.total).toBe(249_999);
    expect(view.chart.points.length).toBeLessThanOrEqual(1000);
    await ctx.db.deleteFrom('readings').where('rig_id', '=', rigId).execute();
  }, 60_000);
});
