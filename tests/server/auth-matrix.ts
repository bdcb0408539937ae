import type request from 'supertest';
import type { Test } from 'supertest';


/** better-auth's admin and organization endpoints over HTTP: what each actor gets (access-matrix.test.ts runs them). */
export type Role = 'anonymous' | 'outsider' | 'advisor' | 'member' | 'owner' | 'admin';
type Agent = ReturnType<typeof request.agent> | ReturnType<typeof request>;
export type AuthFixture = { householdId: string; users: Record<Exclude<Role, 'anonymous'>, { id: string; email: string }>; pendingInvitation: () => Promise<string> };
export type AuthEntry = { send: (a: Agent) => Test | Promise<request.Response>; expect: Record<Role, number> };

const all = (status: number): Record<Role, number> => ({ anonymous: status, outsider: status, advisor: status, member: status, owner: status, admin: status });
/** Refused in front of better-auth (middleware/auth-gate.ts), for everyone alike: nothing reaches it. */
const refused = all(403);
/** A read of the household: its people only; an admin is no one's household member (403 from better-auth). */
const household = { anonymous: 401, outsider: 403, advisor: 200, member: 200, owner: 200, admin: 403 };
const adminOnly = { ...all(403), anonymous: 401, admin: 200 };
const signedIn = (status: number) => ({ ...all(status), anonymous: 401 });

export function authMatrix(fx: AuthFixture): Record<string, AuthEntry> {
  const post = (path: string, body: () => object | Promise<object>) => async (a: Agent) => a.post(`/api/auth${path}`).send(await body());
  const get = (path: () => string | Promise<string>) => async (a: Agent) => a.get(`/api/auth${await path()}`);
  const h = fx.householdId;
  const victim = fx.users.owner.id;
  return {
    'GET /admin/list-users': { send: get(() => '/admin/list-users?limit=5'), expect: adminOnly },
    'POST /admin/set-role': { send: post('/admin/set-role', () => ({ userId: fx.users.outsider.id, role: 'traveller' })), expect: adminOnly },
    'GET /admin/get-user': { send: get(() => `/admin/get-user?id=${victim}`), expect: refused },
    'POST /admin/ban-user': { send: post('/admin/ban-user', () => ({ userId: victim })), expect: refused },
    'POST /admin/unban-user': { send: post('/admin/unban-user', () => ({ userId: victim })), expect: refused },
    'POST /admin/create-user': { send: post('/admin/create-user', () => ({ email: `made-${Date.now()}@example.org`, password: 'a-long-test-password', name: 'Made' })), expect: refused },
    'POST /admin/has-permission': { send: post('/admin/has-permission', () => ({ permissions: { user: ['list'] } })), expect: refused },
    'POST /admin/impersonate-user': { send: post('/admin/impersonate-user', () => ({ userId: victim })), expect: refused },
    'POST /admin/stop-impersonating': { send: post('/admin/stop-impersonating', () => ({})), expect: refused },
    'POST /admin/list-user-sessions': { send: post('/admin/list-user-sessions', () => ({ userId: victim })), expect: refused },
    'POST /admin/revoke-user-session': { send: post('/admin/revoke-user-session', () => ({ sessionToken: 'x' })), expect: refused },
    'POST /admin/revoke-user-sessions': { send: post('/admin/revoke-user-sessions', () => ({ userId: victim })), expect: refused },
    'POST /admin/set-user-password': { send: post('/admin/set-user-password', () => ({ userId: victim, newPassword: 'an-admin-chosen-password' })), expect: refused },
    'POST /admin/update-user': { send: post('/admin/update-user', () => ({ userId: victim, data: { name: 'Renamed' } })), expect: refused },
    'POST /admin/remove-user': { send: post('/admin/remove-user', () => ({ userId: victim })), expect: refused },

    'GET /organization/list': { send: get(() => '/organization/list'), expect: signedIn(200) },
    'GET /organization/get-full-organization': { send: get(() => `/organization/get-full-organization?organizationId=${h}`), expect: household },
    'GET /organization/list-members': { send: get(() => `/organization/list-members?organizationId=${h}&limit=10`), expect: household },
    'GET /organization/get-active-member-role': { send: get(() => `/organization/get-active-member-role?organizationId=${h}`), expect: household },
    // No household is ever made active (the app names the rig in every path): 400 for everyone signed in.
    'GET /organization/get-active-member': { send: get(() => '/organization/get-active-member'), expect: signedIn(400) },
    // better-auth's own rule: invitations are the owner's to manage (the app's People route shows them to the household).
    'GET /organization/list-invitations': { send: get(() => `/organization/list-invitations?organizationId=${h}`), expect: { ...household, advisor: 403, member: 403 } },
    // An invitation to someone else: every account is refused (the invitee's own address only).
    'GET /organization/get-invitation': { send: get(async () => `/organization/get-invitation?id=${await fx.pendingInvitation()}`), expect: signedIn(403) },
    // One's own invitations; without a session better-auth asks for an address, which only the server may give (400).
    'GET /organization/list-user-invitations': { send: get(() => '/organization/list-user-invitations'), expect: { ...signedIn(200), anonymous: 400 } },
    'GET /organization/get-organization': { send: get(() => `/organization/get-organization?organizationId=${h}`), expect: refused },
    'POST /organization/create': { send: post('/organization/create', () => ({ name: 'Side door', slug: `side-${Date.now()}` })), expect: refused },
    'POST /organization/update': { send: post('/organization/update', () => ({ organizationId: h, data: { name: 'Taken over' } })), expect: refused },
    'POST /organization/delete': { send: post('/organization/delete', () => ({ organizationId: h })), expect: refused },
    'POST /organization/check-slug': { send: post('/organization/check-slug', () => ({ slug: 'fixture' })), expect: refused },
    'POST /organization/set-active': { send: post('/organization/set-active', () => ({ organizationId: h })), expect: refused },
    'POST /organization/has-permission': { send: post('/organization/has-permission', () => ({ organizationId: h, permissions: { rig: ['delete'] } })), expect: refused },
    'POST /organization/invite-member': { send: post('/organization/invite-member', () => ({ email: `relay-${Date.now()}@example.org`, role: 'owner', organizationId: h })), expect: refused },
    'POST /organization/accept-invitation': { send: post('/organization/accept-invitation', async () => ({ invitationId: await fx.pendingInvitation() })), expect: refused },
    'POST /organization/reject-invitation': { send: post('/organization/reject-invitation', async () => ({ invitationId: await fx.pendingInvitation() })), expect: refused },
    'POST /organization/cancel-invitation': { send: post('/organization/cancel-invitation', async () => ({ invitationId: await fx.pendingInvitation() })), expect: refused },
    'POST /organization/remove-member': { send: post('/organization/remove-member', () => ({ memberIdOrEmail: fx.users.member.email, organizationId: h })), expect: refused },
    'POST /organization/update-member-role': { send: post('/organization/update-member-role', () => ({ memberId: fx.users.member.id, role: 'owner', organizationId: h })), expect: refused },
    'POST /organization/leave': { send: post('/organization/leave', () => ({ organizationId: h })), expect: refused },
  };
}
