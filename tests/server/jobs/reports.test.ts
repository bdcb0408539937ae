import { beforeAll, describe, expect, it } from 'vitest';

import { enqueueDueReports, reportKey, sendReport } from '@/server/jobs/reports';
import { withHousehold } from '../fixtures';
import { agentFor } from '../helpers';
import { makeTestApp } from '../test-app';
import { emailLog, handClock, mailsTo, privateMaildev, rawHeader, waitFor } from './helpers';

// The reports' hour is Wednesday 03:00 in Pacific/Chatham (UTC+13:45 in its summer, from memory of the tz
// rules; the test asserts the instant it computes, not the offset), a time no other test's accounts use.
const PREFS = { reportsOn: true, reportWeekday: 2, reportHour: 3, timeZone: 'Pacific/Chatham', warningsOn: false, warnAt: 'tight', noteEmailsOn: false };

const clock = handClock('2026-12-08T13:00:00Z');

const { ctx, fx } = withHousehold({ workers: true, overrides: { clock } });
beforeAll(async () => {
  for (const who of ['owner', 'member', 'advisor'] as const) await fx.agents[who].put('/api/me/email-prefs').send(PREFS).expect(200);
});

describe('weekly reports', () => {
  it('fires at each person’s hour in their zone, with the figures of the Outlook at that time', async () => {
    // 2026-12-08 (a Tuesday) 13:00 UTC is Wednesday 2026-12-09 02:45 in Chatham: not yet.
    expect(await enqueueDueReports(ctx, ctx.jobs, new Date('2026-12-08T13:00:00Z'))).toBe(0);
    // The owner moves to Lisbon, Sunday 18:00; the others stay in Chatham.
    await fx.agents.owner.put('/api/me/email-prefs').send({ ...PREFS, timeZone: 'Europe/Lisbon', reportWeekday: 6, reportHour: 18 }).expect(200);
    // 13:15 UTC is 03:00 in Chatham: the member and the advisor are due, through the real tick job.
    await ctx.jobs.boss.send('reports-tick', { at: '2026-12-08T13:15:00Z' });
    const memberMail = await waitFor(async () => (await mailsTo(fx.users.member.email)).find((m) => /parked, margin/.test(m.subject)), 15_000, 'the member’s report');
    expect((await mailsTo(fx.users.owner.email)).filter((m) => /parked, margin/.test(m.subject))).toHaveLength(0);
    const advisorRow = await waitFor(() => emailLog(ctx, reportKey(fx.users.advisor.id, fx.rigId, '2026-12-09')).then((r) => r?.status === 'sent' && r), 15_000, 'the advisor’s report');
    expect(advisorRow.to_address).toBe(fx.users.advisor.email);

    const outlook = (await fx.agents.member.get(`/api/rigs/${fx.rigId}/outlook`).expect(200)).body;
    const row = await emailLog(ctx, reportKey(fx.users.member.id, fx.rigId, '2026-12-09'));
    const f = (row!.meta as { figures: Record<string, unknown> }).figures;
    expect(f.daysParked).toBe(outlook.parked.daysToCutoff);
    expect(f.daysOnRoutine).toBe(outlook.routine.daysToCutoff);
    expect(f.marginState).toBe(outlook.margin.state);
    expect((f.drains as { name: string }[]).map((d) => d.name)).toEqual(outlook.breakdown.slice(0, 4).map((b: { name: string }) => b.name));
    expect((f.fixes as { summary: string }[]).map((x) => x.summary)).toEqual(outlook.fixes.slice(0, 3).map((x: { summary: string }) => x.summary));
    // The mail itself: figures in words, the chart as an inline image, one-click unsubscribe headers.
    expect(memberMail.text).toContain(`Days parked: ${outlook.parked.daysToCutoff === null ? 'more than' : outlook.parked.daysToCutoff.toFixed(1)}`);
    expect(await rawHeader(memberMail.id, 'List-Unsubscribe')).toMatch(/^<http:\/\/127\.0\.0\.1:8080\/api\/email\/unsubscribe\?token=[\w-]+\.[\w-]+>$/);
    expect(await rawHeader(memberMail.id, 'List-Unsubscribe-Post')).toBe('List-Unsubscribe=One-Click');
    expect(memberMail.attachments?.some((a) => a.contentId === 'week-ahead' && a.contentType === 'image/png')).toBe(true);

    // Sunday 2026-12-13 18:00 in Lisbon is 18:00 UTC (winter): the owner's turn, once.
    // A minute before, the owner's is not queued (the count covers every account in the test database,
    // where other files' people may be due, so the owner's own row is what tells).
    await enqueueDueReports(ctx, ctx.jobs, new Date('2026-12-13T17:59:00Z'));
    expect(await emailLog(ctx, reportKey(fx.users.owner.id, fx.rigId, '2026-12-13'))).toBeUndefined();
    expect(await enqueueDueReports(ctx, ctx.jobs, new Date('2026-12-13T18:00:00Z'))).toBeGreaterThanOrEqual(1);
    expect(await emailLog(ctx, reportKey(fx.users.owner.id, fx.rigId, '2026-12-13'))).toBeDefined();
    await waitFor(() => emailLog(ctx, reportKey(fx.users.owner.id, fx.rigId, '2026-12-13')).then((r) => r?.status === 'sent'), 15_000, 'the owner’s report');
    // A later tick in the same window queues nothing again.
    await enqueueDueReports(ctx, ctx.jobs, new Date('2026-12-13T18:10:00Z'));
    await new Promise((r) => setTimeout(r, 1200));
    expect((await mailsTo(fx.users.owner.email)).filter((m) => /parked, margin/.test(m.subject))).toHaveLength(1);
  });

  it('sends one e-mail when the same job runs twice, even at once', async () => {
    const rig = await ctx.db.selectFrom('rigs').select(['id', 'name', 'version', 'power']).where('id', '=', fx.rigId).executeTakeFirstOrThrow();
    const { figuresOfRigs } = await import('@/server/jobs/figures');
    const figures = (await figuresOfRigs(ctx.db, [rig])).get(fx.rigId)!;
    const job = { userId: fx.users.member.id, rigId: fx.rigId, weekKey: '2027-01-06', scheduledFor: '2027-01-05T13:15:00Z', figures };
    const results = await Promise.allSettled([sendReport(ctx, job), sendReport(ctx, job)]);
    await sendReport(ctx, job).catch(() => undefined);
    expect(results.some((r) => r.status === 'fulfilled' && r.value === 'sent')).toBe(true);
    const weekMails = (await mailsTo(fx.users.member.email)).filter((m) => m.text.includes('week of 2027-01-06'));
    expect(weekMails).toHaveLength(1);
  });

  it('unsubscribes through the link without signing in; a forged token is refused', async () => {
    const mail = (await mailsTo(fx.users.member.email)).find((m) => /parked, margin/.test(m.subject))!;
    const link = new URL((await rawHeader(mail.id, 'List-Unsubscribe'))!.slice(1, -1));
    const forged = `${link.searchParams.get('token')!.split('.')[0]}.AAAA${link.searchParams.get('token')!.split('.')[1].slice(4)}`;
    const { default: request } = await import('supertest');
    const refused = await request(ctx.app).get('/api/email/unsubscribe').query({ token: forged }).expect(400);
    expect(refused.body.fields[0].path).toBe('token');
    expect((await fx.agents.member.get('/api/me/email-prefs')).body.reportsOn).toBe(true);
    const page = await request(ctx.app).get(`/api/email/unsubscribe${link.search}`).expect(200);
    expect(page.text).toContain('Weekly reports are off');
    expect((await fx.agents.member.get('/api/me/email-prefs')).body.reportsOn).toBe(false);
    // One-click POST (RFC 8058) from the header, for the advisor's warnings link built the same way.
    await fx.agents.advisor.put('/api/me/email-prefs').send({ ...PREFS, warningsOn: true }).expect(200);
    const { unsubscribeUrl } = await import('@/server/emails/links');
    const url = new URL(unsubscribeUrl(ctx.config, fx.users.advisor.id, 'warnings'));
    await request(ctx.app).post(`/api/email/unsubscribe${url.search}`).type('form').send('List-Unsubscribe=One-Click').expect(200);
    expect((await fx.agents.advisor.get('/api/me/email-prefs')).body.warningsOn).toBe(false);
  });
});

describe('when the SMTP server is down', () => {
  it('records the failure for an admin, retries with backoff and delivers once when it returns', async () => {
    const smtp = privateMaildev(1127, 1181);
    const down = await makeTestApp({ RUN_WORKERS: 'true', SMTP_PORT: '1127', JOB_RETRY_DELAY_SECONDS: '1' });
    try {
      await down.jobs.start({ workers: true });
      const rig = await down.db.selectFrom('rigs').select(['id', 'name', 'version', 'power']).where('id', '=', fx.rigId).executeTakeFirstOrThrow();
      const { figuresOfRigs } = await import('@/server/jobs/figures');
      const figures = (await figuresOfRigs(down.db, [rig])).get(fx.rigId)!;
      await down.db.updateTable('email_prefs').set({ reports_on: true }).where('user_id', '=', fx.users.member.id).execute();
      const key = reportKey(fx.users.member.id, fx.rigId, '2027-02-03');
      await down.jobs.boss.send('report-send', { userId: fx.users.member.id, rigId: fx.rigId, weekKey: '2027-02-03', scheduledFor: '2027-02-02T13:15:00Z', figures });
      const failed = await waitFor(() => emailLog(down, key).then((r) => r?.status === 'failed' && r), 15_000, 'a failed attempt');
      expect(failed.last_error).toMatch(/^send: .*ECONNREFUSED/);
      const failures = (await fx.agents.admin.get('/api/admin/email-failures').expect(200)).body.failures;
      expect(failures.some((x: { key: string }) => x.key === key)).toBe(true);
      await fx.agents.owner.get('/api/admin/email-failures').expect(403);

      await smtp.start();
      const sent = await waitFor(() => emailLog(down, key).then((r) => r?.status === 'sent' && r), 30_000, 'the retried send');
      expect(sent.attempts).toBeGreaterThanOrEqual(2);
      await new Promise((r) => setTimeout(r, 1500));
      const caught = (await mailsTo(fx.users.member.email, smtp.base)).filter((m) => m.text.includes('week of 2027-02-03'));
      expect(caught).toHaveLength(1);
    } finally {
      await down.jobs.stop();
      await down.db.destroy();
      await smtp.stop();
    }
  }, 60_000);
});

describe('account e-mails while the SMTP server is down', () => {
  it('queues the verification e-mail and delivers it when the server is back', async () => {
    const smtp = privateMaildev(1128, 1182);
    const down = await makeTestApp({ RUN_WORKERS: 'true', SMTP_PORT: '1128', JOB_RETRY_DELAY_SECONDS: '1' });
    try {
      await down.jobs.start({ workers: true });
      const email = `late-${Date.now()}@example.org`;
      await agentFor(down.app).post('/api/auth/sign-up/email').send({ name: 'Late', email, password: 'a-long-test-password' }).expect(200);
      await new Promise((r) => setTimeout(r, 1500));
      await smtp.start();
      const mail = await waitFor(async () => (await mailsTo(email, smtp.base))[0], 30_000, 'the retried verification e-mail');
      expect(mail.subject).toBe('Confirm your e-mail address for Keyoff');
      await new Promise((r) => setTimeout(r, 1500));
      expect(await mailsTo(email, smtp.base)).toHaveLength(1);
    } finally {
      await down.jobs.stop();
      await down.db.destroy();
      await smtp.stop();
    }
  }, 60_000);
});
