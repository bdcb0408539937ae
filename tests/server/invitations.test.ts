import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';
import { latestMailTo, signIn, uniqueEmail, verifiedUser, WREN_POWER } from './helpers';

const { ctx, fx } = withHousehold();

async function invite(email: string, role = 'member') {
  const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/invitations`).send({ email, role }).expect(201);
  return res.body.id as string;
}

describe('invitations', () => {
  it('e-mails a link that the invitee follows and accepts once; a second use is refused', async () => {
    const guest = await verifiedUser(ctx, 'guest');
    const id = await invite(guest.email);
    const mail = await latestMailTo(guest.email, /invites you/);
    expect(mail.text).toContain(`/invitations/${id}`);
    expect(mail.subject).toContain('Fixture van household');

    const agent = await signIn(ctx.app, guest.email);
    const seen = await agent.get(`/api/invitations/${id}`).expect(200);
    expect(seen.body).toMatchObject({ householdName: 'Fixture van household', role: 'member' });
    await agent.post(`/api/invitations/${id}/accept`).expect(204);
    const rig = await agent.get(`/api/rigs/${fx.rigId}`).expect(200);
    expect(rig.body.role).toBe('member');
    const again = await agent.post(`/api/invitations/${id}/accept`).expect(409);
    expect(again.body.message).toMatch(/already been used/);
  });

  it('refuses the wrong account', async () => {
    const id = await invite(uniqueEmail('someone-else'));
    const res = await fx.agents.outsider.post(`/api/invitations/${id}/accept`).expect(403);
    expect(res.body.message).toMatch(/another address/);
    await fx.agents.outsider.get(`/api/rigs/${fx.rigId}`).expect(404);
  });

  it('refuses an expired invitation', async () => {
    const late = await verifiedUser(ctx, 'late');
    const id = await invite(late.email);
    await ctx.db.updateTable('invitation').set({ expiresAt: new Date(Date.now() - 60_000) }).where('id', '=', id).execute();
    const agent = await signIn(ctx.app, late.email);
    const res = await agent.post(`/api/invitations/${id}/accept`).expect(410);
    expect(res.body.code).toBe('expired');
    await agent.get(`/api/rigs/${fx.rigId}`).expect(404);
  });

  it('refuses a revoked invitation', async () => {
    const guest = await verifiedUser(ctx, 'revoked');
    const id = await invite(guest.email);
    await fx.agents.owner.delete(`/api/rigs/${fx.rigId}/invitations/${id}`).expect(204);
    const agent = await signIn(ctx.app, guest.email);
    await agent.post(`/api/invitations/${id}/accept`).expect(409);
  });

  it('lists members and pending invitations on the People route', async () => {
    const pending = uniqueEmail('pending');
    await invite(pending, 'advisor');
    const res = await fx.agents.member.get(`/api/rigs/${fx.rigId}/people`).expect(200);
    expect(res.body.members.map((m: { role: string }) => m.role)).toEqual(expect.arrayContaining(['owner', 'member', 'advisor']));
    expect(res.body.invitations.map((i: { email: string }) => i.email)).toContain(pending);
  });

  it('refuses a bad invitation body naming the field, and creates nothing', async () => {
    const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/invitations`).send({ email: 'nope', role: 'king' }).expect(400);
    expect(res.body.fields.map((f: { path: string }) => f.path)).toEqual(expect.arrayContaining(['email', 'role']));
  });
});

describe('roles in the household', () => {
  it('keeps the last owner: neither demoted, removed nor leaving', async () => {
    const ownerMember = (await ctx.db.selectFrom('member').select('id').where('organizationId', '=', fx.householdId).where('userId', '=', fx.users.owner.id).executeTakeFirstOrThrow()).id;
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}/members/${ownerMember}`).send({ role: 'member' }).expect(409);
    await fx.agents.owner.delete(`/api/rigs/${fx.rigId}/members/${ownerMember}`).expect(409);
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/leave`).expect(409);
  });

  it('lets the owner change a member to advisor, who then cannot change anything', async () => {
    const temp = await verifiedUser(ctx, 'temp');
    const m = await ctx.auth.api.addMember({ body: { userId: temp.id, role: 'member', organizationId: fx.householdId } });
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}/members/${m!.id}`).send({ role: 'advisor' }).expect(204);
    const agent = await signIn(ctx.app, temp.email);
    const rig = await agent.get(`/api/rigs/${fx.rigId}`).expect(200);
    expect(rig.body.role).toBe('advisor');
    expect(rig.body.permissions).toMatchObject({ edit: false, manageLoads: false, managePeople: false, comment: true });
    await agent.post(`/api/rigs/${fx.rigId}/invitations`).send({ email: uniqueEmail('x') }).expect(403);
  });
});

describe('the whole story', () => {
  it('a new traveller signs up, creates a rig and its household, invites a member who sees the same rig, and an advisor read-only', async () => {
    const owner = await verifiedUser(ctx, 'story-owner');
    const ownerAgent = await signIn(ctx.app, owner.email);
    const created = await ownerAgent.post('/api/rigs').send({ name: 'Kestrel', vehicle: 'High-top van', power: WREN_POWER }).expect(201);
    const rigId = created.body.id;

    const member = await verifiedUser(ctx, 'story-member');
    const advisor = await verifiedUser(ctx, 'story-advisor', 'advisor');
    const inviteIds: string[] = [];
    for (const [email, role] of [[member.email, 'member'], [advisor.email, 'advisor']]) {
      const res = await ownerAgent.post(`/api/rigs/${rigId}/invitations`).send({ email, role }).expect(201);
      inviteIds.push(res.body.id);
    }
    const memberAgent = await signIn(ctx.app, member.email);
    await memberAgent.post(`/api/invitations/${inviteIds[0]}/accept`).expect(204);
    const advisorAgent = await signIn(ctx.app, advisor.email);
    await advisorAgent.post(`/api/invitations/${inviteIds[1]}/accept`).expect(204);

    const seenByMember = await memberAgent.get('/api/rigs').expect(200);
    expect(seenByMember.body.rigs.map((r: { id: string }) => r.id)).toContain(rigId);
    const seenByAdvisor = await advisorAgent.get(`/api/rigs/${rigId}`).expect(200);
    expect(seenByAdvisor.body).toMatchObject({ name: 'Kestrel', role: 'advisor', permissions: { edit: false } });
    await advisorAgent.post(`/api/rigs/${rigId}/invitations`).send({ email: uniqueEmail('y') }).expect(403);
  });
});
