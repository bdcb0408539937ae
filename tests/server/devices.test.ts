import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { DEVICES } from '@/shared/devices';
import { withTestApp } from './fixtures';

const ctx = withTestApp();

describe('GET /api/devices', () => {
  it('answers the whole catalogue to anyone, signed in or not', async () => {
    const res = await request(ctx.app).get('/api/devices').expect(200);
    expect(res.body.devices).toHaveLength(DEVICES.length);
    expect(res.body.devices[0]).toMatchObject({ id: expect.any(String), name: expect.any(String), load: { supply: expect.any(String) }, source: expect.any(String), note: expect.any(String) });
  });

  it('searches by words and by category', async () => {
    const res = await request(ctx.app).get('/api/devices').query({ q: 'cpap humidifier' }).expect(200);
    expect(res.body.devices.map((d: { id: string }) => d.id)).toEqual(['cpap-no-humidifier', 'cpap-humidifier']);
    const cooling = await request(ctx.app).get('/api/devices').query({ category: 'Cooling', limit: 3 }).expect(200);
    expect(cooling.body.devices).toHaveLength(3);
    expect(cooling.body.devices.every((d: { category: string }) => d.category === 'Cooling')).toBe(true);
  });

  it('refuses a bad query with a 400 naming the field', async () => {
    const res = await request(ctx.app).get('/api/devices').query({ q: 'x'.repeat(61) }).expect(400);
    expect(res.body.fields[0].path).toBe('q');
    const cat = await request(ctx.app).get('/api/devices').query({ category: 'Spaceships' }).expect(400);
    expect(cat.body.fields[0].path).toBe('category');
    await request(ctx.app).get('/api/devices').query({ colour: 'red' }).expect(400);
  });
});
