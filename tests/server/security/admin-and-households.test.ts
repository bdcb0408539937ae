import { sql } from 'kysely';
import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { withHousehold } from '../fixtures';
import { PASSWORD, signIn, verifiedUser } from '../helpers';

const { ctx, fx } = withHousehold();

const sessionsOf = async (userId: string) => (await sql<{ n: number }>`select count(*)::int as n from session where "userId" = ${userId}`.execute(ctx.db)).rows[0].n;

describe('an admin is limited to accounts (issue 15, item 2)', () => {
  it('lists accounts and sets roles, and is refused every other admin endpoint of better-auth', async () => {
    const admin = fx.agents.admin;
    const victim = fx.users.owner.id;
    const listed = await admin.get('/api/auth/admin/list-users').expect(200);
    expect(listed.body.users.length).toBeGreaterThan(0);
    await admin.post('/api/auth/admin/set-role').send({ userId: fx.users.outsider.id, role: 'traveller' }).expect(200);

    const refused: [string, string, object?][] = [
      ['POST', '/admin/impersonate-user', { userId: victim }],
      ['GET', `/admin/list-user-sessions?userId=${victim}`],
      ['POST', '/admin/list-user-sessions', { userId: victim }],
      ['POST', '/admin/set-user-password', { userId: victim, newPassword: 'an-admin-chosen-password' }],
      ['POST', '/admin/update-user', { userId: victim, data: { name: 'Renamed' } }],
      ['POST', '/admin/create-user', { email: 'made-by-admin@example.org', password: 'a-long-test-password', name: 'Made' }],
      ['POST', '/admin/ban-user', { userId: victim }],
      ['POST', '/admin/unban-user', { userId: victim }],
      ['POST', '/admin/revoke-user-session', { sessionToken: 'x' }],
      ['POST', '/admin/revoke-user-sessions', { userId: victim }],
      ['POST', '/admin/remove-user', { userId: victim }],
      ['GET', `/admin/get-user?id=${victim}`],
      ['POST', '/admin/has-permission', { permissions: { user: ['impersonate'] } }],
      ['POST', '/admin/stop-impersonating', {}],
    ];
    const sessionsBefore = await sessionsOf(victim);
    for (const [method, path, body] of refused) {
      const res = method === 'GET' ? await admin.get(`/api/auth${path}`) : await admin.post(`/api/auth${path}`).send(body ?? {});
      expect([path, res.status]).toEqual([path, 403]);
    }
    // Nothing happened to the account: same sessions, same password, same name, not banned.
    expect(await sessionsOf(victim)).toBe(sessionsBefore);
    await signIn(ctx.app, fx.users.owner.email, PASSWORD);
    const user = await ctx.db.selectFrom('user').select(['name', 'banned']).where('id', '=', victim).executeTakeFirstOrThrow();
    expect(user.name).toBe('owner');
    expect(user.banned).not.toBe(true);
    // better-auth's own check agrees when called in the server: the admin role has no impersonation right.
    const direct = await ctx.auth.api.userHasPermission({ body: { userId: fx.users.admin.id, permissions: { user: ['impersonate'] } } });
    expect(direct.success).toBe(false);
  });
});

describe('better-auth’s member list checks its query (issue 15, item 9)', () => {
  it('answers 400 naming an unknown sortBy, filterField or a negative limit, and 200 for a good query', async () => {
    const q = (s: string) => fx.agents.owner.get(`/api/auth/organization/list-members?organizationId=${fx.householdId}&${s}`);
    for (const [query, field] of [
      ['sortBy=password', 'sortBy'],
      ['filterField=__proto__&filterValue=x', 'filterField'],
      ['limit=-1', 'limit'],
      ['offset=-5', 'offset'],
      ['sortDirection=sideways', 'sortDirection'],
      ['colour=red', 'colour'],
    ]) {
      const res = await q(query);
      expect([query, res.status]).toEqual([query, 400]);
      expect(res.body.fields.map((f: { path: string }) => f.path)).toContain(field);
    }
    const good = await q('sortBy=createdAt&sortDirection=desc&limit=2&filterField=role&filterValue=member').expect(200);
    expect(good.body.members.map((m: { role: string }) => m.role)).toEqual(['member']);
    // The admin's account list checks its query the same way.
    const bad = await fx.agents.admin.get('/api/auth/admin/list-users?sortBy=password').expect(400);
    expect(bad.body.fields[0].path).toBe('sortBy');
  });
});

describe('household changes go through the app and its History (issue 15, item 10)', () => {
  it('refuses better-auth’s own member, invitation and household writes; the app’s route removes and records', async () => {
    const extra = await verifiedUser(ctx, 'Extra');
    const member = await ctx.auth.api.addMember({ body: { userId: extra.id, role: 'member', organizationId: fx.householdId } });
    const writes: [string, object][] = [
      ['/organization/remove-member', { memberIdOrEmail: member!.id, organizationId: fx.householdId }],
      ['/organization/update-member-role', { memberId: member!.id, role: 'owner', organizationId: fx.householdId }],
      ['/organization/invite-member', { email: 'relay@example.org', role: 'owner', organizationId: fx.householdId }],
      ['/organization/update', { organizationId: fx.householdId, data: { name: 'Taken over' } }],
      ['/organization/delete', { organizationId: fx.householdId }],
      ['/organization/create', { name: 'Side door', slug: `side-door-${Date.now()}` }],
      ['/organization/set-active', { organizationId: fx.householdId }],
    ];
    for (const [path, body] of writes) {
      const res = await fx.agents.owner.post(`/api/auth${path}`).send(body);
      expect([path, res.status]).toEqual([path, 403]);
    }
    const extraAgent = await signIn(ctx.app, extra.email);
    await extraAgent.post('/api/auth/organization/leave').send({ organizationId: fx.householdId }).expect(403);
    expect(await ctx.db.selectFrom('member').select('id').where('id', '=', member!.id).executeTakeFirst()).toBeTruthy();

    await fx.agents.owner.delete(`/api/rigs/${fx.rigId}/members/${member!.id}`).expect(204);
    const history = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}/history`).expect(200)).body.history;
    expect(history[0]).toMatchObject({ kind: 'member-removed', actor: { id: fx.users.owner.id } });
    expect(history[0].summary).toContain('Extra');
    await extraAgent.get(`/api/rigs/${fx.rigId}`).expect(404);
    await request(ctx.app).get('/api/auth/organization/list').expect(401);
  });
});
