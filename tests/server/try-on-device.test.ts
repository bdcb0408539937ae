import { describe, expect, it } from 'vitest';

import { tryOnDevice } from '@/features/rigs/utils/try-on-device';
import { withTestApp } from './fixtures';
import { signIn } from './helpers';

// Try a load offline runs the same model in the browser on the rig as the API last sent it. Online the
// server is the authority: both must give the same answer for the same saved rig and candidates.
const ctx = withTestApp();

const rigIdOf = async (seedKey: string) => (await ctx.db.selectFrom('rigs').select('id').where('seed_key', '=', seedKey).executeTakeFirstOrThrow()).id;

describe('Try a load on the device and on the server', () => {
  const cases = [
    { rig: 'demo-wren', candidates: [{ name: 'Coffee maker', supply: 'ac', watts: 280, hoursPerDay: 0.25, startHour: 8 }] },
    { rig: 'demo-wren', candidates: [{ name: 'CPAP', supply: 'dc', watts: 30, hoursPerDay: 8, startHour: 22, when: 'parked' }, { name: 'Kettle', supply: 'ac', watts: 250, hoursPerDay: 0.2, dutyPercent: 100 }] },
    { rig: 'demo-stoat', candidates: [{ name: 'Cool box', supply: 'dc', watts: 40, dutyPercent: 50, hoursPerDay: 24 }] },
  ];
  for (const c of cases) {
    it(`gives the same comparison for ${c.rig} with ${c.candidates.map((l) => l.name).join(' and ')}`, async () => {
      const ines = await signIn(ctx.app, 'ines@example.org', 'keyoff-demo-2026');
      const id = await rigIdOf(c.rig);
      const rig = (await ines.get(`/api/rigs/${id}`).expect(200)).body;
      const server = (await ines.post(`/api/rigs/${id}/try`).send({ candidates: c.candidates }).expect(200)).body;
      const device = tryOnDevice(rig, c.candidates as Parameters<typeof tryOnDevice>[1]);
      expect(device).toEqual(server);
      expect(server.delta.dailyAh).toBeGreaterThan(0);
    });
  }
});
