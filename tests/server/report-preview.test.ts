import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';

const { ctx, fx } = withHousehold();

describe('GET /api/rigs/:rigId/report-preview', () => {
  it('shows the next weekly report as the caller would get it, with the Outlook\'s figures and its chart, and sends nothing', async () => {
    const outlook = (await fx.agents.member.get(`/api/rigs/${fx.rigId}/outlook`).expect(200)).body;
    const res = await fx.agents.member.get(`/api/rigs/${fx.rigId}/report-preview`).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.headers['content-security-policy']).toContain("default-src 'none'");
    expect(res.text).toContain('Fixture van: your week ahead');
    expect(res.text).toContain('Hello member');
    expect(res.text).toContain(outlook.parked.daysToCutoff === null ? 'more than' : `${outlook.parked.daysToCutoff.toFixed(1)} days`);
    expect(res.text).toContain('your first weekly report for this rig');
    expect(res.text).toMatch(/src="data:image\/png;base64,iVBOR/);
    expect(res.text).not.toContain('cid:week-ahead');
    const logged = await ctx.db.selectFrom('email_log').select('id').where('rig_id', '=', fx.rigId).execute();
    expect(logged).toHaveLength(0);
  });

  it('is for the household only', async () => {
    await fx.agents.outsider.get(`/api/rigs/${fx.rigId}/report-preview`).expect(404);
    await fx.agents.admin.get(`/api/rigs/${fx.rigId}/report-preview`).expect(404);
    await request(ctx.app).get(`/api/rigs/${fx.rigId}/report-preview`).expect(401);
  });
});
