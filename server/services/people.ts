import type { Db } from '@/db/client';
import type { Auth } from '../auth';
import { viaAuth } from '../auth-errors';
import { HttpError } from '../errors';
import { countOwners, findInvitation, findMember, householdPeople } from '../repositories/rigs';
import { type Actor, recordMembership } from './history';
import { findUser } from '../repositories/users';
import { rigChanged, type WriteCtx } from './rig-changed';
import { insertInvitationSend, invitationSendsSince, lockInvitationSends } from '../repositories/invitations';

type Headers = globalThis.Headers;
const isOwner = (role: string) => role.split(',').includes('owner');
/** The rig the change was asked on: membership is the household's, and this rig's margin is checked after (who is warned may have changed). */
type OnRig = { id: string; household_id: string };

export async function listPeople(db: Db, householdId: string) {
  const { members, invitations } = await householdPeople(db, householdId);
  return {
    members: members.map((m) => ({ ...m, joinedAt: new Date(m.joinedAt as unknown as Date).toISOString() })),
    invitations: invitations.map((i) => ({
      ...i,
      expiresAt: new Date(i.expiresAt as unknown as Date).toISOString(),
      createdAt: new Date(i.createdAt as unknown as Date).toISOString(),
      expired: new Date(i.expiresAt as unknown as Date).getTime() < Date.now(),
    })),
  };
}

export type InviteLimits = { perInviterPerHour: number; perHouseholdPerDay: number };

/**
 * Counts one invitation e-mail against its inviter (an hour) and its household (a day); 429 with the
 * seconds until one is free again when either is used up. Several processes count the same rows.
 */
async function reserveInvitationSend(db: Db, householdId: string, inviterId: string, limits: InviteLimits) {
  await db.transaction().execute(async (trx) => {
    await lockInvitationSends(trx, householdId, inviterId);
    const now = new Date();
    const windows = [
      { by: 'inviter_id' as const, id: inviterId, ms: 3_600_000, max: limits.perInviterPerHour, what: 'You have sent as many invitations as an hour allows' },
      { by: 'household_id' as const, id: householdId, ms: 86_400_000, max: limits.perHouseholdPerDay, what: 'This household has sent as many invitations as a day allows' },
    ];
    for (const w of windows) {
      const { count, oldest } = await invitationSendsSince(trx, w.by, w.id, new Date(now.getTime() - w.ms));
      if (count >= w.max) {
        const retryAfter = oldest ? (oldest.getTime() + w.ms - now.getTime()) / 1000 : w.ms / 1000;
        throw new HttpError(429, 'rate_limited', `${w.what} (${w.max}); try again in ${Math.ceil(retryAfter / 60)} minutes.`, [], retryAfter);
      }
    }
    await insertInvitationSend(trx, householdId, inviterId, now);
  });
}

export async function invite(db: Db, auth: Auth, headers: Headers, inviterId: string, limits: InviteLimits, householdId: string, email: string, role: string, resend = false) {
  await reserveInvitationSend(db, householdId, inviterId, limits);
  const invitation = await viaAuth(() => auth.api.createInvitation({ headers, body: { email, role: role as 'member', organizationId: householdId, resend } }), 'email');
  return { id: invitation.id, email: invitation.email, role: invitation.role, status: invitation.status, expiresAt: new Date(invitation.expiresAt).toISOString() };
}

export async function resendInvitation(db: Db, auth: Auth, headers: Headers, inviterId: string, limits: InviteLimits, householdId: string, invitationId: string) {
  const inv = await findInvitation(db, invitationId);
  if (!inv || inv.householdId !== householdId || inv.status !== 'pending') throw new HttpError(404, 'not_found', 'No such pending invitation.');
  return invite(db, auth, headers, inviterId, limits, householdId, inv.email, inv.role ?? 'member', true);
}

export async function revokeInvitation(db: Db, auth: Auth, headers: Headers, householdId: string, invitationId: string) {
  const inv = await findInvitation(db, invitationId);
  if (!inv || inv.householdId !== householdId || inv.status !== 'pending') throw new HttpError(404, 'not_found', 'No such pending invitation.');
  await viaAuth(() => auth.api.cancelInvitation({ headers, body: { invitationId } }));
}

export async function changeRole(ctx: WriteCtx, auth: Auth, headers: Headers, rig: OnRig, memberId: string, role: string, actor: Actor) {
  const { db } = ctx;
  const householdId = rig.household_id;
  const member = await findMember(db, householdId, memberId);
  if (!member) throw new HttpError(404, 'not_found', 'No such person in this household.');
  if (isOwner(member.role) && role !== 'owner' && (await countOwners(db, householdId)) <= 1) {
    throw new HttpError(409, 'conflict', 'A household needs an owner: make someone else owner first.', [{ path: 'role', message: 'The last owner keeps the owner role.' }]);
  }
  await viaAuth(() => auth.api.updateMemberRole({ headers, body: { memberId, role: role as 'member', organizationId: householdId } }), 'role');
  await recordMembership(db, householdId, actor, 'role-changed', `made ${await nameOf(db, member.userId)} ${role}`);
  rigChanged(ctx, rig.id);
}

const nameOf = async (db: Db, userId: string) => (await findUser(db, userId))?.name ?? 'someone';

export async function removePerson(ctx: WriteCtx, auth: Auth, headers: Headers, rig: OnRig, memberId: string, actor: Actor) {
  const { db } = ctx;
  const householdId = rig.household_id;
  const member = await findMember(db, householdId, memberId);
  if (!member) throw new HttpError(404, 'not_found', 'No such person in this household.');
  if (isOwner(member.role) && (await countOwners(db, householdId)) <= 1) {
    throw new HttpError(409, 'conflict', 'The last owner cannot be removed.');
  }
  await viaAuth(() => auth.api.removeMember({ headers, body: { memberIdOrEmail: memberId, organizationId: householdId } }));
  await recordMembership(db, householdId, actor, 'member-removed', `removed ${await nameOf(db, member.userId)} (${member.role}) from the household`);
  rigChanged(ctx, rig.id);
}

export async function leave(ctx: WriteCtx, auth: Auth, headers: Headers, rig: OnRig, role: string, actor: Actor) {
  const { db } = ctx;
  const householdId = rig.household_id;
  if (isOwner(role) && (await countOwners(db, householdId)) <= 1) {
    throw new HttpError(409, 'conflict', 'The last owner cannot leave: make someone else owner first.');
  }
  await viaAuth(() => auth.api.leaveOrganization({ headers, body: { organizationId: householdId } }));
  await recordMembership(db, householdId, actor, 'member-left', `left the household (was ${role})`);
  rigChanged(ctx, rig.id);
}

/** An invitation as its invitee sees it: only to the address it was sent to, only once, only in time. */
export async function invitationForInvitee(db: Db, invitationId: string, email: string) {
  const inv = await findInvitation(db, invitationId);
  if (!inv) throw new HttpError(404, 'not_found', 'No such invitation.');
  if (inv.email.toLowerCase() !== email.toLowerCase()) {
    throw new HttpError(403, 'forbidden', `This invitation was sent to another address. Sign in as ${inv.email.replace(/^(.).*(@.*)$/, '$1…$2')} to accept it.`);
  }
  if (inv.status !== 'pending') throw new HttpError(409, 'conflict', inv.status === 'accepted' ? 'This invitation has already been used.' : 'This invitation was withdrawn.');
  if (new Date(inv.expiresAt as unknown as Date).getTime() < Date.now()) throw new HttpError(410, 'expired', 'This invitation has expired; ask for a new one.');
  return { id: inv.id, householdName: inv.householdName, inviterName: inv.inviterName, role: inv.role, expiresAt: new Date(inv.expiresAt as unknown as Date).toISOString() };
}

export async function acceptInvitation(db: Db, auth: Auth, headers: Headers, invitationId: string, email: string, actor: Actor) {
  await invitationForInvitee(db, invitationId, email);
  await viaAuth(() => auth.api.acceptInvitation({ headers, body: { invitationId } }));
  const inv = await findInvitation(db, invitationId);
  if (inv) await recordMembership(db, inv.householdId, actor, 'member-joined', `joined the household as ${inv.role ?? 'member'}`);
}
