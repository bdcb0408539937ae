import request from 'supertest';
import type { Express } from 'express';

import type { AppContext } from '@/server/context';
import { TEST_ORIGIN } from './test-app';

export const MAILDEV = 'http://127.0.0.1:1080';
export const PASSWORD = 'a-long-test-password';

type MailDevEmail = { id: string; subject: string; text: string; html: string; to: { address: string }[]; time: string };

/** The newest e-mail maildev caught for an address (real SMTP, read back over maildev's REST API). */
export async function latestMailTo(address: string, subject?: RegExp, timeoutMs = 5000): Promise<MailDevEmail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const all = (await (await fetch(`${MAILDEV}/api/email`)).json()) as MailDevEmail[];
    const mine = all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()) && (!subject || subject.test(m.subject)));
    if (mine.length) return mine.sort((a, b) => b.time.localeCompare(a.time))[0];
    if (Date.now() > deadline) throw new Error(`no e-mail for ${address}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

export function linkIn(mail: MailDevEmail): URL {
  const match = mail.text.match(/https?:\/\/\S+/g);
  if (!match) throw new Error('no link in the e-mail');
  return new URL(match[match.length - 1]);
}

export const uniqueEmail = (label: string) => `${label}-${Date.now()}-${Math.random().toString(36).slice(2, 8)}@example.org`;

/**
 * An agent that keeps cookies and sends the Origin a browser on Keyoff would, on every request (a test of
 * another site's request sets its own: `.set('Origin', 'https://elsewhere.example')`).
 */
export function agentFor(app: Express) {
  return request.agent(app).set('Origin', TEST_ORIGIN);
}

export async function signIn(app: Express, email: string, password = PASSWORD) {
  const agent = agentFor(app);
  const res = await agent.post('/api/auth/sign-in/email').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

/** A verified account made through better-auth itself (its sign-up), then marked verified in the database. */
export async function verifiedUser(ctx: AppContext, label: string, role?: string) {
  const email = uniqueEmail(label);
  const { user } = await ctx.auth.api.signUpEmail({ body: { name: label, email, password: PASSWORD } });
  await ctx.db.updateTable('user').set({ emailVerified: true, ...(role ? { role } : {}) }).where('id', '=', user.id).execute();
  return { id: user.id, email };
}

/** A trip of two stays and two drives (the demo's lake week). */
export const TRIP_PLAN = {
  name: 'Lake week',
  startDate: '2026-06-05',
  active: true,
  legs: [
    { kind: 'drive', date: '2026-06-05', startHour: 10, minutes: 180 },
    { kind: 'stay', name: 'Lake', latitudeDeg: 47.5, nights: 5, lowC: 9, highC: 24 },
    { kind: 'drive', date: '2026-06-10', minutes: 40 },
    { kind: 'stay', name: 'Farm', latitudeDeg: 47.1, nights: 2, lowC: 8, highC: 22, shore: true },
  ],
};

export const WREN_POWER = {
  systemVoltage: 12,
  battery: { chemistry: 'agm', capacityAh: 100 },
  inverter: { ratedW: 300, idleA: 0.45, control: 'always-on' },
  charging: { alternatorA: 20, drivingMinutesPerDay: [0, 0, 40, 0, 0, 0, 0] },
  plannedStayDays: 5,
};

/** A household with an owner, a member and an advisor, an outsider and an admin, and one rig. */
export async function householdFixture(ctx: AppContext & { app: Express }) {
  const owner = await verifiedUser(ctx, 'owner');
  const member = await verifiedUser(ctx, 'member');
  const advisor = await verifiedUser(ctx, 'advisor', 'advisor');
  const outsider = await verifiedUser(ctx, 'outsider');
  const admin = await verifiedUser(ctx, 'admin', 'admin');
  const agents = {
    owner: await signIn(ctx.app, owner.email),
    member: await signIn(ctx.app, member.email),
    advisor: await signIn(ctx.app, advisor.email),
    outsider: await signIn(ctx.app, outsider.email),
    admin: await signIn(ctx.app, admin.email),
  };
  const created = await agents.owner
    .post('/api/rigs')
    .send({ name: 'Fixture van', vehicle: 'test', power: WREN_POWER, loads: [{ name: 'Fridge', supply: 'dc', watts: 45, dutyPercent: 35, hoursPerDay: 24 }] });
  if (created.status !== 201) throw new Error(`rig not created: ${JSON.stringify(created.body)}`);
  const rigId = created.body.id as string;
  const rig = await agents.owner.get(`/api/rigs/${rigId}`);
  const householdId = rig.body.householdId as string;
  await ctx.auth.api.addMember({ body: { userId: member.id, role: 'member', organizationId: householdId } });
  await ctx.auth.api.addMember({ body: { userId: advisor.id, role: 'advisor', organizationId: householdId } });
  return { users: { owner, member, advisor, outsider, admin }, agents, rigId, householdId };
}
