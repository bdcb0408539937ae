import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { withTestApp } from './fixtures';

const ctx = withTestApp();

const post = (body: unknown) => request(ctx.app).post('/api/solar/daily').send(body as object);

describe('POST /api/solar/daily', () => {
  it('answers FAO-56 Example 8 (20° S, 3 September: Ra 32.2 MJ/m²/day) with its clear-sky figures', async () => {
    const res = await post({ latitudeDeg: -20, date: '2026-09-03' }).expect(200);
    expect(res.body.extraterrestrialMJ).toBeCloseTo(32.2, 1);
    // Eq. 37 at sea level: Rso = 0.75 Ra; eq. 34: N = 24 ws / pi with ws = 1.527 rad (Example 8).
    expect(res.body.clearSkyMJ).toBeCloseTo(24.1, 1);
    expect(res.body.daylightHours).toBeCloseTo((24 * 1.527) / Math.PI, 1);
    expect(res.body.peakSunHours).toBeCloseTo(24.1 / 3.6, 1);
  });

  it('answers polar night with zeros, not an error', async () => {
    const res = await post({ latitudeDeg: 80, date: '2026-12-21', elevationM: 100 }).expect(200);
    expect(res.body).toEqual({ extraterrestrialMJ: 0, clearSkyMJ: 0, daylightHours: 0, peakSunHours: 0 });
  });

  it('refuses a latitude beyond 90°, a date that does not exist and an unknown field, naming each', async () => {
    const res = await post({ latitudeDeg: 95, date: '2026-02-30', elevationM: 'high', extra: 1 }).expect(400);
    const paths = (res.body.fields as { path: string }[]).map((f) => f.path);
    expect(paths).toEqual(expect.arrayContaining(['latitudeDeg', 'date', 'elevationM']));
    expect(res.body.fields.length).toBeGreaterThanOrEqual(4);
  });
});
