import { describe, expect, it } from 'vitest';

import { dropVerdict } from '@/shared/energy/drop-verdict';
import { withHousehold } from './fixtures';

const { fx } = withHousehold();

describe('the voltage-drop test\'s verdict', () => {
  it('says a 4.5 % drop on a run allowed 3 % is over, and 2.5 % is within', () => {
    // ABYC E-11: 3 % for critical circuits such as an inverter feed.
    expect(dropVerdict(4.5, 3)).toMatchObject({ within: false, allowedPercent: 3 });
    expect(dropVerdict(4.5, 3).message).toMatch(/4\.5 % lost on a run allowed 3 %: 1\.5 points over/);
    expect(dropVerdict(2.5, 3).within).toBe(true);
    // ABYC E-11: 10 % for non-critical loads.
    expect(dropVerdict(4.5, 10).within).toBe(true);
  });

  it('comes with a test on a saved run, measured against that run\'s allowed drop', async () => {
    const run = await fx.agents.owner
      .post(`/api/rigs/${fx.rigId}/cable-runs`)
      
      .send({ label: 'Inverter feed', lengthM: 2, currentA: 30, maxDropPercent: 3, cableType: 'marine', purpose: 'inverter' })
      .expect(201);
    // 12.60 V at the battery, 12.033 V at the inverter: 0.567 V, 4.5 % of 12.6 V.
    const res = await fx.agents.member.post(`/api/rigs/${fx.rigId}/voltage-drop`).send({ batteryV: 12.6, pointV: 12.033, currentA: 30, cableRunId: run.body.id }).expect(200);
    expect(res.body.dropPercent).toBe(4.5);
    expect(res.body.verdict).toMatchObject({ within: false, allowedPercent: 3 });
    const plain = await fx.agents.member.post(`/api/rigs/${fx.rigId}/voltage-drop`).send({ batteryV: 12.6, pointV: 12.5, currentA: 30 }).expect(200);
    expect(plain.body.verdict).toBeNull();
  });
});
