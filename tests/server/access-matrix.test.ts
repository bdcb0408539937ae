import type { Test } from 'supertest';
import sharp from 'sharp';
import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { unsubscribeToken } from '@/server/emails/unsubscribe';
import { authMatrix } from './auth-matrix';
import { listRoutes } from './list-routes';
import { withHousehold } from './fixtures';
import { agentFor, TRIP_PLAN, uniqueEmail, WREN_POWER } from './helpers';

type Role = 'anonymous' | 'outsider' | 'advisor' | 'member' | 'owner' | 'admin';
const ROLES: Role[] = ['anonymous', 'outsider', 'advisor', 'member', 'owner', 'admin'];


const { ctx, fx } = withHousehold();


type Ctx = { rigId: string };
type Entry = {
  send: (agent: ReturnType<typeof request.agent> | ReturnType<typeof request>, c: Ctx) => Test | Promise<request.Response>;
  expect: Record<Role, number>;
  /** Runs after a request that changed the fixture, to put it back. */
  restore?: (role: Role, status: number) => Promise<void>;
};

const all = (status: number): Record<Role, number> => ({ anonymous: status, outsider: status, advisor: status, member: status, owner: status, admin: status });
// Reading a rig: household roles only; outsiders and even admins get 404 (no discovering rigs).
const readRig = { anonymous: 401, outsider: 404, advisor: 200, member: 200, owner: 200, admin: 404 };
const ownerOnly = (ok: number) => ({ anonymous: 401, outsider: 404, advisor: 403, member: 403, owner: ok, admin: 404 });

async function pendingInvitation() {
  const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/invitations`).send({ email: uniqueEmail('invitee'), role: 'member' });
  return res.body.id as string;
}
async function throwawayMember() {
  const { user } = await ctx.auth.api.signUpEmail({ body: { name: 'Throwaway', email: uniqueEmail('throwaway'), password: 'a-long-test-password' } });
  const m = await ctx.auth.api.addMember({ body: { userId: user.id, role: 'member', organizationId: fx.householdId } });
  return m!.id;
}
async function throwawayRig() {
  const res = await fx.agents.owner.post('/api/rigs').send({ name: 'Spare', householdId: fx.householdId, power: WREN_POWER });
  return res.body.id as string;
}
async function throwawayLoad() {
  const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/loads`).send(LOAD);
  return res.body.id as string;
}
async function throwawayRun() {
  const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/cable-runs`).send(RUN);
  return res.body.id as string;
}
async function throwawayTrip() {
  const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/trips`).send({ ...TRIP_PLAN, active: false });
  return res.body.id as string;
}
const RUN = { label: 'Fridge feed', to: 'Fridge', lengthM: 3, currentA: 5, maxDropPercent: 3, cableType: 'marine' };
async function throwawayNote(agent: ReturnType<typeof request.agent> | ReturnType<typeof request>, own: boolean) {
  const household = [fx.agents.owner, fx.agents.member, fx.agents.advisor] as unknown[];
  const author = own && household.includes(agent) ? (agent as typeof fx.agents.owner) : fx.agents.owner;
  const res = await author.post(`/api/rigs/${fx.rigId}/notes`).send({ body: 'A note' });
  return (res.body.id as string) ?? (await ownerNote());
}
async function ownerNote() {
  const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/notes`).send({ body: 'Owner note' });
  return res.body.id as string;
}
const currentVersion = async () => (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body.version as number;
const LOAD = { name: 'Fan', supply: 'dc', watts: 20, hoursPerDay: 4 };
const editRole = (ok: number) => ({ anonymous: 401, outsider: 404, advisor: 403, member: ok, owner: ok, admin: 404 });

const memberIdOf = async (userId: string) =>
  (await ctx.db.selectFrom('member').select('id').where('organizationId', '=', fx.householdId).where('userId', '=', userId).executeTakeFirstOrThrow()).id;

/** An e-mail recorded as sent about the rig (what the report job leaves), for the Reports routes. */
let sentEmail: string | null = null;
async function sentEmailId() {
  sentEmail ??= (
    await ctx.db
      .insertInto('email_log')
      .values({ idempotency_key: `matrix:${fx.rigId}`, kind: 'report', user_id: fx.users.owner.id, rig_id: fx.rigId, status: 'sent', to_address: fx.users.owner.email, subject: 'Report', html: '<p>Report <img src="cid:week-ahead"></p>', text: 'Report', chart_png: Buffer.from([0x89, 0x50, 0x4e, 0x47]), last_error: null, created_at: new Date(), sent_at: new Date() })
      .returning('id')
      .executeTakeFirstOrThrow()
  ).id;
  return sentEmail;
}
const CSV = Buffer.from('time,volts\n2026-11-20T18:00:00Z,12.6\n2026-11-20T19:00:00Z,12.58\n');
const PNG = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#17324A' } }).png().toBuffer();
/** Who added a reading, log or photo (or the owner) may delete it: each editor deletes one of their own. */
const authorOf = (agent: unknown) => (agent === fx.agents.member ? fx.agents.member : fx.agents.owner);
async function throwawayReading(agent?: unknown) {
  await authorOf(agent).post(`/api/rigs/${fx.rigId}/readings`).send({ at: '2026-11-20T08:00:00Z', voltageV: 12.5 });
  return (await ctx.db.selectFrom('readings').select('id').where('rig_id', '=', fx.rigId).where('upload_id', 'is', null).orderBy('created_at', 'desc').executeTakeFirstOrThrow()).id;
}
async function throwawayUpload(agent?: unknown) {
  return (await authorOf(agent).post(`/api/rigs/${fx.rigId}/uploads`).field('mapping', JSON.stringify({ time: 'time', voltage: 'volts' })).attach('file', CSV, 'log.csv')).body.upload.id as string;
}
async function throwawayPhoto(agent?: unknown) {
  return (await authorOf(agent).post(`/api/rigs/${fx.rigId}/photos`).attach('file', PNG, 'dot.png')).body.id as string;
}
let photo: string | null = null;

/** The owner applies the cut-off switch Fix to the fixture rig; the history entry's id undoes it. */
async function appliedFix() {
  const { version } = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
  await fx.agents.owner.post(`/api/rigs/${fx.rigId}/fixes/apply`).send({ kind: 'cutoff-switch', version });
  return (await fx.agents.owner.get(`/api/rigs/${fx.rigId}/history`)).body.history[0].id as string;
}
async function undoLatestFix() {
  const entry = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}/history`)).body.history.find((h: { undoable: boolean }) => h.undoable);
  if (entry) await fx.agents.owner.post(`/api/rigs/${fx.rigId}/history/${entry.id}/undo`).expect(200);
}

const PREFS = { reportsOn: true, reportWeekday: 6, reportHour: 18, timeZone: 'UTC', warningsOn: true, warnAt: 'tight', noteEmailsOn: true };

const MATRIX: Record<string, Entry> = {
  'GET /api/health/': { send: (a) => a.get('/api/health'), expect: all(200) },
  'GET /api/openapi.json/': { send: (a) => a.get('/api/openapi.json'), expect: all(200) },
  'POST /api/projections/': { send: (a) => a.post('/api/projections').send({ battery: { chemistry: 'agm', capacityAh: 100 } }), expect: all(200) },
  'POST /api/projections/compare': {
    send: (a) => a.post('/api/projections/compare').send({ rig: { battery: { chemistry: 'agm', capacityAh: 100 } }, candidates: [{ name: 'Fan', supply: 'dc', watts: 20, hoursPerDay: 4 }] }),
    expect: all(200),
  },
  'GET /api/devices/': { send: (a) => a.get('/api/devices?q=fridge'), expect: all(200) },
  'POST /api/solar/daily': { send: (a) => a.post('/api/solar/daily').send({ latitudeDeg: -20, date: '2026-09-03' }), expect: all(200) },
  'POST /api/cable-runs/size': { send: (a) => a.post('/api/cable-runs/size').send({ currentA: 10, lengthM: 2 }), expect: all(200) },
  'GET /api/me/': { send: (a) => a.get('/api/me'), expect: { ...all(200), anonymous: 401 } },
  'GET /api/rigs/': { send: (a) => a.get('/api/rigs'), expect: { ...all(200), anonymous: 401 } },
  'POST /api/rigs/': {
    send: (a) => a.post('/api/rigs').send({ name: 'Another van', power: WREN_POWER }),
    expect: { ...all(201), anonymous: 401 },
  },
  'GET /api/rigs/:rigId': { send: (a, c) => a.get(`/api/rigs/${c.rigId}`), expect: readRig },
  'POST /api/hookups/': { send: (a) => a.post('/api/hookups').send({ battery: { chemistry: 'agm', capacityAh: 100 }, inverter: { ratedW: 300 } }), expect: all(200) },
  'GET /api/rigs/:rigId/hookup': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/hookup`), expect: readRig },
  'GET /api/rigs/:rigId/cable-runs': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/cable-runs`), expect: readRig },
  'GET /api/rigs/:rigId/trips': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/trips`), expect: readRig },
  'POST /api/rigs/:rigId/trips': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/trips`).send({ ...TRIP_PLAN, active: false }), expect: editRole(201) },
  'GET /api/rigs/:rigId/trips/:tripId/outlook': { send: async (a, c) => a.get(`/api/rigs/${c.rigId}/trips/${await throwawayTrip()}/outlook`), expect: readRig },
  'PUT /api/rigs/:rigId/trips/:tripId': {
    send: async (a, c) => a.put(`/api/rigs/${c.rigId}/trips/${await throwawayTrip()}`).send({ ...TRIP_PLAN, active: false, name: 'Renamed' }),
    expect: editRole(200),
  },
  'DELETE /api/rigs/:rigId/trips/:tripId': { send: async (a, c) => a.delete(`/api/rigs/${c.rigId}/trips/${await throwawayTrip()}`), expect: editRole(204) },
  'POST /api/rigs/:rigId/cable-runs': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/cable-runs`).send(RUN), expect: editRole(201) },
  'PATCH /api/rigs/:rigId/cable-runs/:runId': {
    send: async (a, c) => a.patch(`/api/rigs/${c.rigId}/cable-runs/${await throwawayRun()}`).send({ ...RUN, lengthM: 4 }),
    expect: editRole(200),
  },
  'DELETE /api/rigs/:rigId/cable-runs/:runId': {
    send: async (a, c) => a.delete(`/api/rigs/${c.rigId}/cable-runs/${await throwawayRun()}`),
    expect: editRole(204),
  },
  'GET /api/rigs/:rigId/notes': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/notes`), expect: readRig },
  'POST /api/rigs/:rigId/notes': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/notes`).send({ body: 'Looks good' }), expect: { ...readRig, advisor: 201, member: 201, owner: 201 } },
  'POST /api/rigs/:rigId/notes/read': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/notes/read`), expect: { ...readRig, advisor: 204, member: 204, owner: 204 } },
  'PATCH /api/rigs/:rigId/notes/:noteId': {
    // Each household role edits a note of its own; outsiders and anonymous callers aim at the owner's.
    send: async (a, c) => a.patch(`/api/rigs/${c.rigId}/notes/${await throwawayNote(a, true)}`).send({ body: 'Edited' }),
    expect: { ...readRig, advisor: 204, member: 204, owner: 204 },
  },
  'DELETE /api/rigs/:rigId/notes/:noteId': {
    // The owner may delete anyone's note; the others are tried on the owner's note.
    send: async (a, c) => a.delete(`/api/rigs/${c.rigId}/notes/${await ownerNote()}`),
    expect: { anonymous: 401, outsider: 404, advisor: 403, member: 403, owner: 204, admin: 404 },
  },
  'POST /api/rigs/:rigId/notes/:noteId/resolve': {
    send: async (a, c) => a.post(`/api/rigs/${c.rigId}/notes/${await ownerNote()}/resolve`),
    expect: { ...readRig, advisor: 204, member: 204, owner: 204 },
  },
  'POST /api/rigs/:rigId/notes/:noteId/reopen': {
    send: async (a, c) => a.post(`/api/rigs/${c.rigId}/notes/${await ownerNote()}/reopen`),
    expect: { ...readRig, advisor: 204, member: 204, owner: 204 },
  },
  'GET /api/clients/': { send: (a) => a.get('/api/clients'), expect: { ...all(200), anonymous: 401 } },
  'GET /api/rigs/:rigId/people': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/people`), expect: readRig },
  'PATCH /api/rigs/:rigId': {
    send: async (a, c) => a.patch(`/api/rigs/${c.rigId}`).send({ version: await currentVersion(), vehicle: 'Matrix van' }),
    expect: ownerOnly(200),
  },
  'DELETE /api/rigs/:rigId': {
    send: async (a) => a.delete(`/api/rigs/${await throwawayRig()}`),
    expect: ownerOnly(204),
  },
  'GET /api/rigs/:rigId/outlook': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/outlook`), expect: readRig },
  'GET /api/rigs/:rigId/sheet.pdf': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/sheet.pdf`), expect: readRig },
  'POST /api/rigs/:rigId/try': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/try`).send({ candidates: [LOAD] }), expect: readRig },
  'POST /api/rigs/:rigId/loads': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/loads`).send(LOAD), expect: editRole(201) },
  // Tried on a load the owner added: a member changes only their own (tests/server/load-ownership.test.ts).
  'PATCH /api/rigs/:rigId/loads/:loadId': {
    send: async (a, c) => a.patch(`/api/rigs/${c.rigId}/loads/${await throwawayLoad()}`).send({ ...LOAD, watts: 25 }),
    expect: { ...editRole(200), member: 403 },
  },
  'DELETE /api/rigs/:rigId/loads/:loadId': {
    send: async (a, c) => a.delete(`/api/rigs/${c.rigId}/loads/${await throwawayLoad()}`),
    expect: { ...editRole(204), member: 403 },
  },
  'POST /api/rigs/:rigId/invitations': {
    send: (a, c) => a.post(`/api/rigs/${c.rigId}/invitations`).send({ email: uniqueEmail('matrix'), role: 'member' }),
    expect: ownerOnly(201),
  },
  'POST /api/rigs/:rigId/invitations/:invitationId/resend': {
    send: async (a, c) => a.post(`/api/rigs/${c.rigId}/invitations/${await pendingInvitation()}/resend`),
    expect: ownerOnly(200),
  },
  'DELETE /api/rigs/:rigId/invitations/:invitationId': {
    send: async (a, c) => a.delete(`/api/rigs/${c.rigId}/invitations/${await pendingInvitation()}`),
    expect: ownerOnly(204),
  },
  'PATCH /api/rigs/:rigId/members/:memberId': {
    send: async (a, c) => a.patch(`/api/rigs/${c.rigId}/members/${await memberIdOf(fx.users.member.id)}`).send({ role: 'member' }),
    expect: ownerOnly(204),
  },
  'DELETE /api/rigs/:rigId/members/:memberId': {
    send: async (a, c) => a.delete(`/api/rigs/${c.rigId}/members/${await throwawayMember()}`),
    expect: ownerOnly(204),
  },
  'POST /api/rigs/:rigId/leave': {
    send: (a, c) => a.post(`/api/rigs/${c.rigId}/leave`),
    // The last owner cannot leave (409); a member or an advisor can, and is put back afterwards.
    expect: { anonymous: 401, outsider: 404, advisor: 204, member: 204, owner: 409, admin: 404 },
    restore: async (role, status) => {
      if (status !== 204) return;
      const user = role === 'advisor' ? fx.users.advisor : fx.users.member;
      await ctx.auth.api.addMember({ body: { userId: user.id, role: role as 'member', organizationId: fx.householdId } });
    },
  },
  'GET /api/invitations/:invitationId': {
    // Sent to somebody else: every signed-in account is refused.
    send: async (a) => a.get(`/api/invitations/${await pendingInvitation()}`),
    expect: { ...all(403), anonymous: 401 },
  },
  'POST /api/invitations/:invitationId/accept': {
    send: async (a) => a.post(`/api/invitations/${await pendingInvitation()}/accept`),
    expect: { ...all(403), anonymous: 401 },
  },
  'GET /api/rigs/:rigId/history': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/history`), expect: readRig },
  'GET /api/rigs/:rigId/report-preview': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/report-preview`), expect: readRig },
  'POST /api/rigs/:rigId/fixes/preview': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/fixes/preview`).send({ kind: 'cutoff-switch' }), expect: readRig },
  'POST /api/rigs/:rigId/fixes/apply': {
    send: async (a, c) => {
      const { version } = (await fx.agents.owner.get(`/api/rigs/${c.rigId}`)).body;
      return a.post(`/api/rigs/${c.rigId}/fixes/apply`).send({ kind: 'cutoff-switch', version });
    },
    expect: ownerOnly(200),
    restore: async (_role, status) => (status === 200 ? undoLatestFix() : undefined),
  },
  'POST /api/rigs/:rigId/history/:entryId/undo': {
    send: async (a, c) => a.post(`/api/rigs/${c.rigId}/history/${await appliedFix()}/undo`),
    expect: ownerOnly(200),
    restore: async (_role, status) => (status === 200 ? undefined : undoLatestFix()),
  },
  'GET /api/rigs/:rigId/emails': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/emails`), expect: readRig },
  'GET /api/rigs/:rigId/emails/:emailId': { send: async (a, c) => a.get(`/api/rigs/${c.rigId}/emails/${await sentEmailId()}`), expect: readRig },
  'GET /api/rigs/:rigId/emails/:emailId/chart.png': { send: async (a, c) => a.get(`/api/rigs/${c.rigId}/emails/${await sentEmailId()}/chart.png`), expect: readRig },
  'GET /api/me/email-prefs': { send: (a) => a.get('/api/me/email-prefs'), expect: { ...all(200), anonymous: 401 } },
  'PUT /api/me/email-prefs': { send: (a) => a.put('/api/me/email-prefs').send(PREFS), expect: { ...all(200), anonymous: 401 } },
  'PUT /api/me/units': { send: (a) => a.put('/api/me/units').send({ energy: 'Ah' }), expect: { ...all(200), anonymous: 401 } },
  // Open: the signed token is the permission (here the outsider's own).
  'GET /api/email/unsubscribe': { send: (a) => a.get(`/api/email/unsubscribe?token=${unsubscribeToken(ctx.config.AUTH_SECRET, fx.users.outsider.id, 'notes')}`), expect: all(200) },
  'POST /api/email/unsubscribe': { send: (a) => a.post(`/api/email/unsubscribe?token=${unsubscribeToken(ctx.config.AUTH_SECRET, fx.users.outsider.id, 'notes')}`), expect: all(200) },
  'GET /api/admin/email-failures': { send: (a) => a.get('/api/admin/email-failures'), expect: { ...all(403), anonymous: 401, admin: 200 } },
  'POST /api/readings/analyze': { send: (a) => a.post('/api/readings/analyze').send({ chemistry: 'agm', capacityAh: 100, readings: [{ at: '2026-11-20T18:00:00Z', voltageV: 12.6, rested: true }] }), expect: all(200) },
  'GET /api/rigs/:rigId/readings': { send: (a, c) => a.get(`/api/rigs/${c.rigId}/readings`), expect: readRig },
  'POST /api/rigs/:rigId/readings': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/readings`).send({ at: '2026-11-20T08:00:00Z', voltageV: 12.5 }), expect: editRole(201) },
  'DELETE /api/rigs/:rigId/readings/:readingId': { send: async (a, c) => a.delete(`/api/rigs/${c.rigId}/readings/${await throwawayReading(a)}`), expect: editRole(204) },
  'POST /api/rigs/:rigId/voltage-drop': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/voltage-drop`).send({ batteryV: 12.6, pointV: 12.4, currentA: 5 }), expect: readRig },
  'POST /api/rigs/:rigId/uploads/preview': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/uploads/preview`).attach('file', CSV, 'log.csv'), expect: editRole(200) },
  'POST /api/rigs/:rigId/uploads': {
    send: (a, c) => a.post(`/api/rigs/${c.rigId}/uploads`).field('mapping', JSON.stringify({ time: 'time', voltage: 'volts' })).attach('file', CSV, 'log.csv'),
    expect: editRole(201),
  },
  'DELETE /api/rigs/:rigId/uploads/:uploadId': { send: async (a, c) => a.delete(`/api/rigs/${c.rigId}/uploads/${await throwawayUpload(a)}`), expect: editRole(204) },
  'POST /api/rigs/:rigId/photos': { send: (a, c) => a.post(`/api/rigs/${c.rigId}/photos`).attach('file', PNG, 'dot.png'), expect: editRole(201) },
  'GET /api/rigs/:rigId/photos/:photoId': { send: async (a, c) => a.get(`/api/rigs/${c.rigId}/photos/${(photo ??= await throwawayPhoto())}`), expect: readRig },
  'DELETE /api/rigs/:rigId/photos/:photoId': { send: async (a, c) => a.delete(`/api/rigs/${c.rigId}/photos/${await throwawayPhoto(a)}`), expect: editRole(204) },
  'GET /api/admin/users': { send: (a) => a.get('/api/admin/users'), expect: { ...all(403), anonymous: 401, admin: 200 } },
  'PUT /api/admin/users/:userId/role': {
    send: (a) => a.put(`/api/admin/users/${fx.users.outsider.id}/role`).send({ role: 'traveller' }),
    expect: { ...all(403), anonymous: 401, admin: 204 },
  },
};

/** better-auth's admin and organization endpoints, as its server API lists them: "METHOD /path". */
const authEndpoints = () =>
  Object.values(ctx.auth.api as Record<string, { path?: string; options?: { method?: string | string[] } }>)
    .filter((e) => e?.path && /^\/(admin|organization)\//.test(e.path))
    .map((e) => `${[e.options?.method].flat().join('|')} ${e.path}`);

describe('the access matrix of better-auth’s admin and organization endpoints', () => {
  const auth = () => authMatrix({ householdId: fx.householdId, users: fx.users, pendingInvitation });

  it('has an entry for every admin and organization endpoint better-auth serves', () => {
    expect(authEndpoints().sort()).toEqual(Object.keys(auth()).sort());
  });

  it('answers each actor as the table says, and no entry changed anything', async () => {
    const failures: string[] = [];
    for (const [endpoint, entry] of Object.entries(auth())) {
      for (const role of ROLES) {
        const res = await entry.send(role === 'anonymous' ? agentFor(ctx.app) : fx.agents[role]);
        if (res.status !== entry.expect[role]) failures.push(`${endpoint} ${role}: ${res.status}, expected ${entry.expect[role]}`);
      }
    }
    expect(failures).toEqual([]);
    // The household is as it was: same people in the same roles.
    const people = await ctx.db.selectFrom('member').select(['userId', 'role']).where('organizationId', '=', fx.householdId).orderBy('role').execute();
    expect(people.map((p) => p.role)).toEqual(['advisor', 'member', 'owner']);
  });
});

describe('the access matrix', () => {
  it('has an entry for every API route there is', () => {
    const routes = listRoutes(ctx.app).sort();
    expect(routes).toEqual(Object.keys(MATRIX).sort());
  });

  for (const [route, entry] of Object.entries(MATRIX)) {
    it(`${route}: ${ROLES.map((r) => `${r} ${entry.expect[r]}`).join(', ')}`, async () => {
      const got: Partial<Record<Role, number>> = {};
      for (const role of ROLES) {
        const agent = role === 'anonymous' ? agentFor(ctx.app) : fx.agents[role];
        const res = await entry.send(agent, { rigId: fx.rigId });
        got[role] = res.status;
        await entry.restore?.(role, res.status);
      }
      expect(got).toEqual(entry.expect);
    });
  }

  it('answers 404 for a rig id that does not exist or is not an id, for everyone', async () => {
    await fx.agents.owner.get('/api/rigs/00000000-0000-4000-8000-000000000000').expect(404);
    await fx.agents.owner.get('/api/rigs/not-an-id').expect(404);
  });
});
