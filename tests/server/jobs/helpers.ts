import { spawn, type ChildProcess } from 'node:child_process';
import { createConnection } from 'node:net';

import type { AppContext } from '@/server/context';
import { MAILDEV, type signIn, WREN_POWER } from '../helpers';

export type MailDevFull = { id: string; subject: string; text: string; html: string; to: { address: string }[]; headers: Record<string, string>; attachments?: { contentId: string; contentType: string }[] };

export async function mailsTo(address: string, base = MAILDEV): Promise<MailDevFull[]> {
  const all = (await (await fetch(`${base}/api/email`)).json()) as MailDevFull[];
  return all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/** One header of the message as it arrived (maildev's parsed headers leave some out), unfolded. */
export async function rawHeader(id: string, name: string, base = MAILDEV): Promise<string | null> {
  const source = await (await fetch(`${base}/api/email/${id}/source`)).text();
  const head = source.split(/\r?\n\r?\n/)[0].replace(/\r?\n[ \t]+/g, ' ');
  const line = head.split(/\r?\n/).find((l) => l.toLowerCase().startsWith(`${name.toLowerCase()}:`));
  return line ? line.slice(name.length + 1).trim() : null;
}

/** Polls until the check returns something truthy (the queue's workers run on their own timers). */
export async function waitFor<T>(check: () => Promise<T | null | undefined | false>, timeoutMs = 15_000, what = 'the condition'): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const v = await check();
    if (v) return v;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

/** A clock the test moves by hand. */
export function handClock(iso: string) {
  let now = new Date(iso);
  return { now: () => now, set: (next: string) => (now = new Date(next)) };
}

export const emailLog = (ctx: AppContext, key: string) => ctx.db.selectFrom('email_log').selectAll().where('idempotency_key', '=', key).executeTakeFirst();

const portOpen = (port: number) =>
  new Promise<boolean>((resolve) => {
    const s = createConnection({ host: '127.0.0.1', port }, () => {
      s.destroy();
      resolve(true);
    });
    s.on('error', () => resolve(false));
  });

/** A second, private maildev (its own ports), started and stopped by the test: an SMTP server that can go down. */
export function privateMaildev(smtp: number, web: number) {
  let child: ChildProcess | null = null;
  return {
    base: `http://127.0.0.1:${web}`,
    async start() {
      const c = spawn('node_modules/.bin/maildev', ['--ip', '127.0.0.1', '--web-ip', '127.0.0.1', '--smtp', String(smtp), '--web', String(web)], { stdio: ['ignore', 'pipe', 'pipe'] });
      child = c;
      // What it printed, for the error if it does not come up (a port taken, a crash).
      let said = '';
      c.stdout!.on('data', (d: Buffer) => (said += d));
      c.stderr!.on('data', (d: Buffer) => (said += d));
      let exited = false;
      c.once('exit', () => (exited = true));
      try {
        await waitFor(async () => {
          if (exited) throw new Error(`maildev on ${smtp} exited: ${said.trim()}`);
          return (await portOpen(smtp)) && (await portOpen(web));
        }, 30_000, `maildev on ${smtp}`);
      } catch (err) {
        throw new Error(`${(err as Error).message}; it said: ${said.trim() || 'nothing'}`);
      }
      c.stdout!.removeAllListeners('data').resume();
      c.stderr!.removeAllListeners('data').resume();
    },
    async stop() {
      if (!child) return;
      const c = child;
      child = null;
      if (c.exitCode !== null || c.signalCode !== null) return;
      await new Promise<void>((resolve) => {
        c.once('exit', () => resolve());
        c.kill('SIGTERM');
      });
    },
  };
}

// A rig whose margin the test moves with the planned stay alone: 400 Ah of AGM and a 45 W fridge at 35 %
// lasts several days, so a stay of 1 day is Comfortable, one just under the days is Tight, one over is Short
// (the thresholds in shared/energy/defaults.ts: Tight below max(1 day, a quarter of the stay)).
const MARGIN_POWER = { ...WREN_POWER, battery: { chemistry: 'agm', capacityAh: 400 }, inverter: null };

/** Creates that rig as the agent's (planned stay 1 day); `setStay` changes the stay and answers the Outlook. */
export async function marginRig(agent: Awaited<ReturnType<typeof signIn>>, name: string) {
  const created = await agent
    .post('/api/rigs')
    .send({ name, vehicle: 'test', power: { ...MARGIN_POWER, plannedStayDays: 1 }, loads: [{ name: 'Fridge', supply: 'dc', watts: 45, dutyPercent: 35, hoursPerDay: 24 }] })
    .expect(201);
  const rigId: string = created.body.id;
  const setStay = async (days: number) => {
    const rig = (await agent.get(`/api/rigs/${rigId}`).expect(200)).body;
    await agent.patch(`/api/rigs/${rigId}`).send({ version: rig.version, power: { ...rig.power, plannedStayDays: days } }).expect(200);
    return (await agent.get(`/api/rigs/${rigId}/outlook`).expect(200)).body;
  };
  return { rigId, setStay };
}
