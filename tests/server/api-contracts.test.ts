import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';

import * as admin from '@/shared/api/admin';
import * as cableRuns from '@/shared/api/cable-runs';
import * as devices from '@/shared/api/devices';
import * as email from '@/shared/api/email';
import * as fixes from '@/shared/api/fixes';
import * as health from '@/shared/api/health';
import * as hookups from '@/shared/api/hookups';
import * as loads from '@/shared/api/loads';
import * as me from '@/shared/api/me';
import * as notes from '@/shared/api/notes';
import * as people from '@/shared/api/people';
import * as projections from '@/shared/api/projections';
import * as readings from '@/shared/api/readings';
import * as reports from '@/shared/api/reports';
import * as rigs from '@/shared/api/rigs';
import * as solar from '@/shared/api/solar';
import * as trips from '@/shared/api/trips';
import type { Comparison } from '@/shared/energy/compare';
import type { Projection } from '@/shared/energy/project';
import type { CableRunResult } from '@/shared/energy/wiring';
import type { HookupPlan } from '@/shared/energy/hookup/plan';
import type { TripOutlook } from '@/shared/energy/trip';
import { DEMO_PASSWORD } from '@/shared/demo/scenario';
import type { cableRunsOf } from '@/server/services/cable-runs';
import type { historyOf } from '@/server/services/history';
import type { notesOf } from '@/server/services/notes';
import type { listPeople } from '@/server/services/people';
import type { readingsOf } from '@/server/services/readings-view';
import type { listRigs, readRig } from '@/server/services/rigs';
import { unsubscribeToken } from '@/server/emails/unsubscribe';
import { householdFixture, signIn, TRIP_PLAN, uniqueEmail } from './helpers';
import { makeTestApp, TEST_ORIGIN } from './test-app';

// Each endpoint called on real data (the seeded demo and a household made here), its answer parsed with
// its response schema from shared/api: strict objects, so a renamed, missing or extra field fails.

let ctx: Awaited<ReturnType<typeof makeTestApp>>;
let fx: Awaited<ReturnType<typeof householdFixture>>;
let ines: Awaited<ReturnType<typeof signIn>>;
let wrenId: string;

beforeAll(async () => {
  ctx = await makeTestApp();
  fx = await householdFixture(ctx);
  ines = await signIn(ctx.app, 'ines@example.org', DEMO_PASSWORD);
  const list = (await ines.get('/api/rigs').expect(200)).body as z.infer<typeof rigs.rigListSchema>;
  wrenId = list.rigs.find((r) => r.name === 'Wren')!.id;
}, 60_000);
afterAll(async () => {
  await ctx.db.destroy();
});

type Sent = { status: number; body: unknown };
/** The answer's status, and its body parsed with the schema (the error names the field that failed). */
function holds(res: Sent, status: number, schema: z.ZodType) {
  expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(status);
  const parsed = schema.safeParse(res.body);
  expect(parsed.success ? [] : parsed.error.issues.slice(0, 5)).toEqual([]);
  return res.body as any;
}

const post = (agent: typeof ines, path: string, body?: object) => agent.post(path).set('Origin', TEST_ORIGIN).send(body);
const LOAD = { name: 'Fan', supply: 'dc', watts: 20, hoursPerDay: 4 };
const WREN_LIKE = { battery: { chemistry: 'agm', capacityAh: 100 }, inverter: { ratedW: 300 }, loads: [{ name: 'Laptop', supply: 'ac', watts: 60, hoursPerDay: 3 }] };

describe('the open routes answer as their schemas say', () => {
  it('health, projections, compare, solar, cable sizing, hook-ups, devices, analysis', async () => {
    const open = request(ctx.app);
    holds(await open.get('/api/health'), 200, health.healthSchema);
    const p = holds(await open.post('/api/projections').send(WREN_LIKE), 200, projections.projectionSchema);
    expect(p.fixes.length).toBeGreaterThan(0);
    holds(await open.post('/api/projections/compare').send({ rig: WREN_LIKE, candidates: [LOAD] }), 200, projections.comparisonSchema);
    holds(await open.post('/api/solar/daily').send({ latitudeDeg: -20, date: '2026-09-03' }), 200, solar.dailySunSchema);
    holds(await open.post('/api/cable-runs/size').send({ currentA: 20, lengthM: 7.62 }), 200, cableRuns.cableRunSizedSchema);
    holds(await open.post('/api/cable-runs/size').send({ inverterW: 1000, purpose: 'inverter', lengthM: 1.5 }), 200, cableRuns.cableRunSizedSchema);
    holds(await open.post('/api/hookups').send({ ...WREN_LIKE, inverter: { ratedW: 300, control: 'ignition-relay' } }), 200, hookups.hookupAnswerSchema);
    const d = holds(await open.get('/api/devices'), 200, devices.deviceListSchema);
    expect(d.devices.length).toBeGreaterThan(50);
    const readingsIn = [
      { at: '2026-11-20T18:00:00Z', voltageV: 12.7, currentA: 0.1, rested: false },
      { at: '2026-11-21T06:00:00Z', voltageV: 12.6, currentA: 0.1, rested: false },
    ];
    holds(await open.post('/api/readings/analyze').send({ chemistry: 'agm', capacityAh: 100, readings: readingsIn }), 200, readings.analysisAnswerSchema);
    const token = unsubscribeToken(ctx.config.AUTH_SECRET, fx.users.outsider.id, 'notes');
    holds(await open.post(`/api/email/unsubscribe?token=${token}`).set('Origin', TEST_ORIGIN), 200, email.unsubscribedSchema);
  });
});

describe('the demo household’s answers hold to their schemas', () => {
  it('the rigs, Wren, its Outlook, Try a load, hook-up, cable runs, trips, notes, people, history, e-mails, readings', async () => {
    holds(await ines.get('/api/me'), 200, me.meSchema);
    holds(await ines.get('/api/me/email-prefs'), 200, me.savedEmailPrefsSchema);
    holds(await ines.get('/api/rigs'), 200, rigs.rigListSchema);
    const wren = holds(await ines.get(`/api/rigs/${wrenId}`), 200, rigs.rigSchema);
    expect(wren.loads.length).toBeGreaterThan(0);
    holds(await ines.get(`/api/rigs/${wrenId}/outlook`), 200, rigs.outlookSchema);
    holds(await post(ines, `/api/rigs/${wrenId}/try`, { candidates: [LOAD] }), 200, rigs.tryResultSchema);
    holds(await ines.get(`/api/rigs/${wrenId}/hookup`), 200, hookups.rigHookupSchema);
    holds(await ines.get(`/api/rigs/${wrenId}/cable-runs`), 200, cableRuns.cableRunListSchema);
    holds(await ines.get(`/api/rigs/${wrenId}/trips`), 200, trips.tripListSchema);
    holds(await ines.get(`/api/rigs/${wrenId}/notes`), 200, notes.notesSchema);
    holds(await ines.get(`/api/rigs/${wrenId}/people`), 200, people.peopleSchema);
    holds(await ines.get(`/api/rigs/${wrenId}/history`), 200, reports.historySchema);
    holds(await ines.get(`/api/rigs/${wrenId}/emails`), 200, reports.sentEmailListSchema);
    holds(await ines.get(`/api/rigs/${wrenId}/readings?timeZone=Europe/Lisbon`), 200, readings.readingsViewSchema);
    const fix = (await ines.get(`/api/rigs/${wrenId}/outlook`)).body.fixes[0].kind;
    holds(await post(ines, `/api/rigs/${wrenId}/fixes/preview`, { kind: fix }), 200, fixes.fixPreviewAnswerSchema);
  });

  it('the advisor’s clients', async () => {
    const marguerite = await signIn(ctx.app, 'marguerite@example.org', DEMO_PASSWORD);
    const c = holds(await marguerite.get('/api/clients'), 200, rigs.clientListSchema);
    expect(c.clients.length).toBeGreaterThan(0);
  });

  it('the admin’s accounts and failed e-mails', async () => {
    const a = await signIn(ctx.app, 'admin@example.org', DEMO_PASSWORD);
    holds(await a.get('/api/admin/users'), 200, admin.accountListSchema);
    holds(await a.get('/api/admin/email-failures'), 200, admin.emailFailureListSchema);
  });
});

describe('writes answer as their schemas say (on a household made for this test)', () => {
  const CSV = Buffer.from('time,volts,amps\n2026-11-20T18:00:00Z,12.7,0.2\n2026-11-20T19:00:00Z,12.68,0.2\n2026-11-21T06:00:00Z,12.6,0.2\n');

  it('a rig, loads, cable runs, a trip, Fixes, notes, invitations, readings, logs and photos', async () => {
    const owner = fx.agents.owner;
    const base = `/api/rigs/${fx.rigId}`;
    holds(await post(owner, '/api/rigs', { name: 'Contract van', power: { battery: { chemistry: 'agm', capacityAh: 100 } } }), 201, rigs.rigCreatedSchema);
    const load = holds(await post(owner, `${base}/loads`, LOAD), 201, loads.savedLoadSchema);
    holds(await owner.patch(`${base}/loads/${load.id}`).set('Origin', TEST_ORIGIN).send({ ...LOAD, watts: 25 }), 200, loads.savedLoadSchema);
    const version = (await owner.get(base)).body.version;
    holds(await owner.patch(base).set('Origin', TEST_ORIGIN).send({ version, vehicle: 'Contract vehicle' }), 200, rigs.rigVersionSchema);

    const run = holds(await post(owner, `${base}/cable-runs`, { label: 'Inverter feed', lengthM: 2, inverterLink: true, purpose: 'inverter' }), 201, cableRuns.savedCableRunSchema);
    holds(await owner.patch(`${base}/cable-runs/${run.id}`).set('Origin', TEST_ORIGIN).send({ label: 'Fan feed', lengthM: 3, loadId: load.id }), 200, cableRuns.savedCableRunSchema);
    holds(await owner.get(`${base}/hookup?control=ignition-relay`), 200, hookups.rigHookupSchema);

    const trip = holds(await post(owner, `${base}/trips`, TRIP_PLAN), 201, trips.savedTripSchema);
    holds(await owner.put(`${base}/trips/${trip.id}`).set('Origin', TEST_ORIGIN).send({ ...TRIP_PLAN, name: 'Lake fortnight' }), 200, trips.savedTripSchema);
    holds(await owner.get(`${base}/trips/${trip.id}/outlook`), 200, trips.tripOutlookAnswerSchema);
    const outlook = holds(await owner.get(`${base}/outlook`), 200, rigs.outlookSchema);
    expect(outlook.trip).not.toBeNull();

    const kind = outlook.fixes[0].kind;
    holds(await post(owner, `${base}/fixes/apply`, { kind, version: outlook.version }), 200, rigs.rigVersionSchema);
    const history = holds(await owner.get(`${base}/history`), 200, reports.historySchema);
    holds(await post(owner, `${base}/history/${history.history.find((h: { undoable: boolean }) => h.undoable).id}/undo`), 200, rigs.rigVersionSchema);

    const note = holds(await post(fx.agents.advisor, `${base}/notes`, { body: 'About the fan', targetKind: 'load', targetId: load.id }), 201, notes.noteCreatedSchema);
    holds(await post(owner, `${base}/notes`, { body: 'Noted', parentId: note.id }), 201, notes.noteCreatedSchema);
    const thread = holds(await owner.get(`${base}/notes`), 200, notes.notesSchema).threads[0];
    expect(thread.replies).toHaveLength(1);

    const invitation = holds(await post(owner, `${base}/invitations`, { email: uniqueEmail('contract'), role: 'member' }), 201, people.invitationSentSchema);
    holds(await post(owner, `${base}/invitations/${invitation.id}/resend`), 200, people.invitationSentSchema);
    holds(await owner.get(`${base}/people`), 200, people.peopleSchema);

    holds(await post(fx.agents.member, `${base}/readings`, { at: '2026-11-21T07:00:00Z', voltageV: 12.55 }), 201, readings.readingAddedSchema);
    holds(await owner.post(`${base}/uploads/preview`).set('Origin', TEST_ORIGIN).attach('file', CSV, 'log.csv'), 200, readings.logPreviewSchema);
    holds(await owner.post(`${base}/uploads`).set('Origin', TEST_ORIGIN).field('mapping', JSON.stringify({ time: 'time', voltage: 'volts', current: 'amps' })).attach('file', CSV, 'log.csv'), 201, readings.uploadResultSchema);
    const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#17324A' } }).png().toBuffer();
    const photo = holds(await owner.post(`${base}/photos`).set('Origin', TEST_ORIGIN).field('caption', 'Fuse').attach('file', png, 'fuse.png'), 201, readings.photoAddedSchema);
    holds(await owner.get(`${base}/photos/${photo.id}`), 200, readings.photoUrlsSchema);
    holds(await post(owner, `${base}/voltage-drop`, { batteryV: 12.6, pointV: 12.4, currentA: 5, cableRunId: run.id }), 200, readings.dropResultSchema);
    const view = holds(await owner.get(`${base}/readings?timeZone=UTC`), 200, readings.readingsViewSchema);
    expect([view.spot.length, view.uploads.length, view.photos.length, view.chart.points.length > 0]).toEqual([1, 1, 1, true]);

    await ctx.db
      .insertInto('email_log')
      .values({ idempotency_key: `contract:${fx.rigId}`, kind: 'report', user_id: fx.users.owner.id, rig_id: fx.rigId, status: 'sent', to_address: fx.users.owner.email, subject: 'Report', html: '<p>Report</p>', text: 'Report', chart_png: null, last_error: null, created_at: new Date(), sent_at: new Date() })
      .execute();
    expect(holds(await owner.get(`${base}/emails`), 200, reports.sentEmailListSchema).emails).toHaveLength(1);
    holds(await owner.put('/api/me/email-prefs').set('Origin', TEST_ORIGIN).send({ reportsOn: true, reportWeekday: 6, reportHour: 18, timeZone: 'UTC', warningsOn: true, warnAt: 'tight', noteEmailsOn: true }), 200, me.savedEmailPrefsSchema);
  });

  it('the invitee’s view of an invitation', async () => {
    const invitee = uniqueEmail('invitee');
    const sent = (await post(fx.agents.owner, `/api/rigs/${fx.rigId}/invitations`, { email: invitee, role: 'member' })).body;
    const { user } = await ctx.auth.api.signUpEmail({ body: { name: 'Invitee', email: invitee, password: 'a-long-test-password' } });
    await ctx.db.updateTable('user').set({ emailVerified: true }).where('id', '=', user.id).execute();
    const agent = await signIn(ctx.app, invitee);
    holds(await agent.get(`/api/invitations/${sent.id}`), 200, people.invitationViewSchema);
  });
});

describe('the schemas are strict enough to catch a change of shape', () => {
  it('fails a real answer with one field renamed, one dropped or one added', async () => {
    const rig = (await ines.get(`/api/rigs/${wrenId}`)).body;
    expect(rigs.rigSchema.safeParse(rig).success).toBe(true);
    const { householdName, ...dropped } = rig;
    expect(rigs.rigSchema.safeParse({ ...dropped, household: householdName }).success).toBe(false);
    expect(rigs.rigSchema.safeParse(dropped).success).toBe(false);
    expect(rigs.rigSchema.safeParse({ ...rig, extra: 1 }).success).toBe(false);
    const outlook = (await ines.get(`/api/rigs/${wrenId}/outlook`)).body;
    const { daysToCutoff, ...parked } = outlook.parked;
    expect(rigs.outlookSchema.safeParse({ ...outlook, parked: { ...parked, daysToCutOff: daysToCutoff } }).success).toBe(false);
  });
});

// Type-level: what the services and the model return is what the schemas say (tsc checks these).
type Out<F extends (...a: any) => any> = Awaited<ReturnType<F>>;
/** Compiles only when each type is assignable to the other. */
const sameShape = <A, B>(..._: [A] extends [B] ? ([B] extends [A] ? [] : ['the schema’s type is not the server’s']) : ['the server’s type is not the schema’s']) => undefined;
/** Compiles when what the server sends fits the schema's type (where the server's is narrower: a constant). */
const fits = <Server, Schema>(..._: [Server] extends [Schema] ? [] : ['the server’s type is not the schema’s']) => undefined;
describe('the services’ own types agree with the schemas', () => {
  it('type-checks (tsc fails otherwise)', () => {
    sameShape<Projection, z.infer<typeof projections.projectionSchema>>();
    sameShape<Comparison, z.infer<typeof projections.comparisonSchema>>();
    sameShape<TripOutlook, Omit<trips.TripOutlookAnswer, 'tripId' | 'name'>>();
    sameShape<CableRunResult, cableRuns.CableRunSized>();
    sameShape<HookupPlan, z.infer<typeof hookups.hookupAnswerSchema>>();
    sameShape<Out<typeof readRig>, rigs.Rig>();
    sameShape<Out<typeof listRigs>[number], rigs.RigSummary>();
    sameShape<Out<typeof cableRunsOf>[number], cableRuns.SavedCableRun>();
    sameShape<Out<typeof notesOf>, notes.Notes>();
    sameShape<Out<typeof listPeople>, people.People>();
    sameShape<Out<typeof historyOf>[number], reports.HistoryEntry>();
    fits<Out<typeof readingsOf>, readings.Readings>();
  });
});
