import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { enqueueDueReports, reportKey } from '@/server/jobs/reports';
import { verifiedUser, WREN_POWER } from '../helpers';
import { makeTestApp } from '../test-app';
import { emailLog, mailsTo, waitFor } from './helpers';

// Twenty people share one rig; their reports go out while the worker process is stopped half-way and a
// new one takes over: every report arrives, none twice. Then a send that "crashed" after claiming its
// e-mail (the row left in 'sending') is finished by a retry once its lease runs out.
const schema = `pgboss_t${Math.random().toString(36).slice(2, 10)}`;
const env = { RUN_WORKERS: 'true', JOBS_SCHEMA: schema, SEND_LEASE_SECONDS: '2' };
const PREFS = { reports_on: true, report_weekday: 4, report_hour: 5, time_zone: 'Asia/Kathmandu', warnings_on: false, note_emails_on: false };
const AT = new Date('2026-12-10T23:15:00Z'); // Friday 05:00 in Kathmandu (UTC+5:45)

let first: Awaited<ReturnType<typeof makeTestApp>>;
let people: { id: string; email: string }[] = [];
let rigId: string;

beforeAll(async () => {
  first = await makeTestApp(env);
  people = [];
  for (let i = 0; i < 20; i += 1) people.push(await verifiedUser(first, `batch${i}`));
  const org = await first.auth.api.createOrganization({ body: { name: 'Batch household', slug: `batch-${Date.now()}`, userId: people[0].id } });
  for (const p of people.slice(1)) await first.auth.api.addMember({ body: { userId: p.id, role: 'member', organizationId: org!.id } });
  const rig = await first.db.insertInto('rigs').values({ household_id: org!.id, created_by: people[0].id, name: 'Batch van', vehicle: 'test', power: JSON.stringify(WREN_POWER), created_at: new Date(), updated_at: new Date() }).returning('id').executeTakeFirstOrThrow();
  rigId = rig.id;
  await first.db.insertInto('email_prefs').values(people.map((p) => ({ user_id: p.id, ...PREFS, updated_at: new Date() }))).execute();
});
afterAll(async () => {
  await first.db.destroy();
});

const sentCount = async () => (await first.db.selectFrom('email_log').select('idempotency_key').where('rig_id', '=', rigId).where('status', '=', 'sent').execute()).length;

describe('a restart in the middle of a batch', () => {
  it('loses nothing and sends nothing twice', async () => {
    expect(await enqueueDueReports(first, first.jobs, AT)).toBeGreaterThanOrEqual(20);
    await first.jobs.start({ workers: true });
    await waitFor(async () => (await sentCount()) >= 3, 20_000, 'the first sends');
    await first.jobs.stop();
    const atStop = await sentCount();

    const second = await makeTestApp(env);
    try {
      await second.jobs.start({ workers: true });
      await waitFor(async () => (await sentCount()) === 20, 40_000, 'all twenty reports');
      await new Promise((r) => setTimeout(r, 1500));
      for (const p of people) {
        const mine = (await mailsTo(p.email)).filter((m) => m.subject.startsWith('Batch van:'));
        expect(mine, p.email).toHaveLength(1);
      }
      expect(atStop, "the first worker stopped before the batch was done").toBeLessThan(20);
    } finally {
      await second.jobs.stop();
      await second.db.destroy();
    }
  }, 90_000);

  it('finishes a send that crashed after its claim, once, when the lease runs out', async () => {
    const p = people[0];
    const key = reportKey(p.id, rigId, '2026-12-18');
    // What a worker leaves when it dies between claiming the e-mail and sending it.
    await first.db.insertInto('email_log').values({ idempotency_key: key, kind: 'report', user_id: p.id, rig_id: rigId, status: 'sending', attempts: 1, locked_at: new Date(), last_error: null, to_address: null, subject: null, html: null, text: null, chart_png: null, created_at: new Date() }).execute();
    const worker = await makeTestApp(env);
    try {
      await worker.jobs.start({ workers: true });
      await enqueueDueReports(worker, worker.jobs, new Date('2026-12-17T23:15:00Z'));
      // The tick skips keys it already knows: queue the send as the dead worker's job would be retried.
      const { figuresOfRigs } = await import('@/server/jobs/figures');
      const rig = await worker.db.selectFrom('rigs').select(['id', 'name', 'version', 'power']).where('id', '=', rigId).executeTakeFirstOrThrow();
      await worker.jobs.boss.send('report-send', { userId: p.id, rigId, weekKey: '2026-12-18', scheduledFor: '2026-12-17T23:15:00Z', figures: (await figuresOfRigs(worker.db, [rig])).get(rigId) });
      const row = await waitFor(() => emailLog(worker, key).then((r) => r?.status === 'sent' && r), 30_000, 'the resumed send');
      expect(row.attempts).toBeGreaterThanOrEqual(2);
      await new Promise((r) => setTimeout(r, 1500));
      expect((await mailsTo(p.email)).filter((m) => m.text.includes('week of 2026-12-18'))).toHaveLength(1);
    } finally {
      await worker.jobs.stop();
      await worker.db.destroy();
    }
  }, 60_000);
});
