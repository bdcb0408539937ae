import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { withTestApp } from './fixtures';

const ctx = withTestApp();

const post = (body: unknown) => request(ctx.app).post('/api/cable-runs/size').send(body as object);
const paths = (res: request.Response) => (res.body.fields as { path: string }[]).map((f) => f.path);

const valid = { systemVoltage: 12, currentA: 20, lengthM: 7.62, maxDropPercent: 3, insulationC: 105, engineSpace: false, returnPath: 'cable', continuous: false };

describe('POST /api/cable-runs/size', () => {
  it('answers the size, drop, ampacity, fuse, breaker and cautions', async () => {
    const res = await post(valid).expect(200);
    // 20 A over 25 ft one way at 3 %: 4 AWG drops 0.308 V (REFERENCES.md, NEC Table 8 worked example).
    expect(res.body).toMatchObject({ awg: '4', dropV: 0.308 });
    expect(typeof res.body.mm2).toBe('number');
    expect(res.body.ampacityA).toBe(160); // 33 CFR 183.425 Table 5, 4 AWG at 105 °C
    expect(res.body.fuseA).toBe(20);
    expect(res.body.breaker.standard).toBe('SAE J553');
    expect(res.body.cautions.length).toBeGreaterThan(2);
  });

  it('refuses zero or negative length and current, naming the fields', async () => {
    const res = await post({ ...valid, currentA: 0, lengthM: -2 }).expect(400);
    expect(paths(res)).toEqual(expect.arrayContaining(['currentA', 'lengthM']));
  });

  it('refuses an allowed drop of 0 % or over 50 %', async () => {
    expect(paths(await post({ ...valid, maxDropPercent: 0 }).expect(400))).toContain('maxDropPercent');
    expect(paths(await post({ ...valid, maxDropPercent: 51 }).expect(400))).toContain('maxDropPercent');
  });

  it('refuses an insulation rating that is not a Table 5 column and a return path it does not know', async () => {
    const res = await post({ ...valid, insulationC: 70, returnPath: 'water' }).expect(400);
    expect(paths(res)).toEqual(expect.arrayContaining(['insulationC', 'returnPath']));
  });

  it('says when no conductor in the table carries the current, with 422', async () => {
    const res = await post({ ...valid, currentA: 800, lengthM: 10 }).expect(422);
    expect(res.body.code).toBe('no_conductor');
    expect(res.body.message).toMatch(/No conductor in the table/);
  });

  it('refuses strings where numbers belong', async () => {
    const res = await post({ ...valid, currentA: '20' }).expect(400);
    expect(paths(res)).toContain('currentA');
  });

  it('sizes an inverter feed from inverterW: rated watts at the 10.5 V cut-out and 90 %, continuous', async () => {
    // 1000 / (10.5 × 0.9) = 105.8 A (REFERENCES.md, Inverters and their switching: common practice);
    // continuous, so at least 125 % = 132.3 A of protection (NEC 210.20(A)): the 150 A standard rating (NEC 240.6(A)).
    const { currentA: _c, ...rest } = valid;
    const res = await post({ ...rest, inverterW: 1000, purpose: 'inverter', lengthM: 1.5 }).expect(200);
    expect(res.body.currentA).toBeCloseTo(105.82, 2);
    expect(res.body.basis).toMatchObject({ inverterW: 1000, cutoutV: 10.5, continuous: true });
    expect(res.body.fuseA).toBe(150);
  });

  it('refuses inverterW without the inverter purpose, and with a current too, naming the fields', async () => {
    const { currentA: _c, ...rest } = valid;
    expect(paths(await post({ ...rest, inverterW: 600 }).expect(400))).toContain('purpose');
    expect(paths(await post({ ...valid, inverterW: 600, purpose: 'inverter' }).expect(400))).toContain('currentA');
    expect(paths(await post({ ...rest, inverterW: -5, purpose: 'inverter' }).expect(400))).toContain('inverterW');
  });
});
