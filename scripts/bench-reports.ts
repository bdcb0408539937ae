// The weekly-report batch for 10,000 rigs: the tick that finds who is due, computes each rig's figures
// (the model with its Fixes) and queues the send jobs in pg-boss; target under 60 s. Then the send
// rate: the real workers render (MJML, the chart PNG) and send a sample of them to maildev over SMTP.
// Runs on its own database (keyoff_bench), emptied first.
import { randomUUID } from 'node:crypto';
import { sql } from 'kysely';
import { pino } from 'pino';

import { loadConfig } from '@/server/config';
import { createContext } from '@/server/context';
import { migrateAll } from '@/server/migrate';
import { enqueueDueReports } from '@/server/jobs/reports';
import { loadToRow } from '@/server/services/rigs-model';
import { WREN, WREN_LOADS } from '@/shared/demo/scenario';
import { loadSchema } from '@/shared/schemas/projection';
import { record } from './bench-results';

const RIGS = Number(process.env.BENCH_RIGS ?? 10_000);
const SEND_SAMPLE = Number(process.env.BENCH_SEND_SAMPLE ?? 300);
const AT = new Date('2026-12-06T18:00:00Z'); // a Sunday, 18:00 UTC: the default report hour for everyone

async function main() {
  const url = process.env.DATABASE_URL ?? 'postgres://keyoff@127.0.0.1:54329/keyoff_bench';
  const config = loadConfig({ ...process.env, DATABASE_URL: url, NODE_ENV: 'production', LOG_LEVEL: 'silent', RUN_WORKERS: 'true', JOB_POLL_SECONDS: '0.5' });
  const ctx = createContext(process.env, { config, logger: pino({ level: 'silent' }) });
  await migrateAll(ctx.auth, ctx.db);
  await ctx.jobs.start({ workers: false });

  // 10,000 households, each one traveller and one rig with Wren's loads, written straight into the tables.
  const t0 = performance.now();
  const { loads: _l, ...power } = WREN;
  const loads = WREN_LOADS.map((l) => loadSchema.parse(l));
  for (let i = 0; i < RIGS; i += 1000) {
    const n = Math.min(1000, RIGS - i);
    const users = Array.from({ length: n }, (_, k) => ({ id: randomUUID(), name: `Bench ${i + k}`, email: `bench-${i + k}-${Date.now()}@example.org`, emailVerified: true, createdAt: new Date(), updatedAt: new Date() }));
    const orgs = users.map((u) => ({ id: randomUUID(), name: `${u.name} household`, slug: `bench-${u.id}`, createdAt: new Date() }));
    await ctx.db.insertInto('user').values(users).execute();
    await ctx.db.insertInto('organization').values(orgs).execute();
    await ctx.db.insertInto('member').values(users.map((u, k) => ({ id: randomUUID(), organizationId: orgs[k].id, userId: u.id, role: 'owner', createdAt: new Date() }))).execute();
    const rigs = await ctx.db
      .insertInto('rigs')
      .values(orgs.map((o, k) => ({ household_id: o.id, created_by: users[k].id, name: `Bench rig ${i + k}`, vehicle: 'van', power: JSON.stringify({ ...power, plannedStayDays: 2 + (k % 5) }), created_at: new Date(), updated_at: new Date() })))
      .returning('id')
      .execute();
    const rows = rigs.flatMap((r, k) => loads.map((l, p) => ({ ...loadToRow(l, p, users[k].id), rig_id: r.id })));
    for (let j = 0; j < rows.length; j += 2000) await ctx.db.insertInto('loads').values(rows.slice(j, j + 2000)).execute();
  }
  const setupS = (performance.now() - t0) / 1000;

  const t1 = performance.now();
  const queued = await enqueueDueReports(ctx, ctx.jobs, AT);
  const batchS = (performance.now() - t1) / 1000;

  // Send rate: the real workers on a sample (the rest are cancelled after).
  const t2 = performance.now();
  const worker = createContext(process.env, { config, logger: pino({ level: 'silent' }) });
  await worker.jobs.start({ workers: true });
  const table = sql.table(`${config.JOBS_SCHEMA}.job`);
  for (;;) {
    const { rows } = await sql<{ n: string }>`select count(*) as n from email_log where status = 'sent'`.execute(ctx.db);
    if (Number(rows[0].n) >= SEND_SAMPLE) break;
    await new Promise((r) => setTimeout(r, 200));
  }
  const sendS = (performance.now() - t2) / 1000;
  await worker.jobs.stop();
  await sql`update ${table} set state = 'cancelled' where name = 'report-send' and state in ('created', 'retry')`.execute(ctx.db);
  await worker.db.destroy();
  await ctx.jobs.stop();
  await ctx.db.destroy();

  const result = { rigs: RIGS, setupSeconds: +setupS.toFixed(1), queued, batchSeconds: +batchS.toFixed(2), perRigMs: +((batchS * 1000) / RIGS).toFixed(3), sent: SEND_SAMPLE, sendSeconds: +sendS.toFixed(1), emailsPerSecond: +(SEND_SAMPLE / sendS).toFixed(1) };
  console.log(`weekly reports: ${queued} of ${RIGS} rigs computed and queued in ${result.batchSeconds} s (${result.perRigMs} ms a rig; target under 60 s)`);
  console.log(`report e-mails rendered and sent to maildev: ${SEND_SAMPLE} in ${result.sendSeconds} s = ${result.emailsPerSecond} a second`);
  record('reports', result);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
