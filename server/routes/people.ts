import { Router } from 'express';
import { fromNodeHeaders } from 'better-auth/node';

import { invitationCreateSchema, invitationParamsSchema, invitationSentSchema, memberParamsSchema, memberRoleSchema, peopleSchema } from '@/shared/api/people';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { actorOf, session } from '../middleware/session';
import * as people from '../services/people';

/** /api/rigs/:rigId: the household's people: members, invitations, and leaving. */
export function peopleRouter(ctx: AppContext) {
  const { db, auth, config } = ctx;
  const router = Router({ mergeParams: true });
  const inviteLimits = { perInviterPerHour: config.INVITES_PER_INVITER_PER_HOUR, perHouseholdPerDay: config.INVITES_PER_HOUSEHOLD_PER_DAY };
  const headers = (req: { headers: Record<string, string | string[] | undefined> }) => fromNodeHeaders(req.headers);
  const me = (res: Parameters<typeof session>[0]) => session(res).user.id;

  router.get('/people', rigAccess(db, { people: ['read'] }), handler({ response: peopleSchema }, ({ res }) => people.listPeople(db, rigOf(res).household_id)));

  router.post('/invitations', rigAccess(db, { people: ['manage'] }), handler({ body: invitationCreateSchema, response: invitationSentSchema, status: 201 }, ({ body, req, res }) =>
    people.invite(db, auth, headers(req), me(res), inviteLimits, rigOf(res).household_id, body.email, body.role)));

  router.post('/invitations/:invitationId/resend', rigAccess(db, { people: ['manage'] }), handler({ params: invitationParamsSchema, response: invitationSentSchema }, ({ params, req, res }) =>
    people.resendInvitation(db, auth, headers(req), me(res), inviteLimits, rigOf(res).household_id, params.invitationId)));

  router.delete('/invitations/:invitationId', rigAccess(db, { people: ['manage'] }), handler({ params: invitationParamsSchema, status: 204 }, async ({ params, req, res }) => {
    await people.revokeInvitation(db, auth, headers(req), rigOf(res).household_id, params.invitationId);
  }));

  router.patch('/members/:memberId', rigAccess(db, { people: ['manage'] }), handler({ params: memberParamsSchema, body: memberRoleSchema, status: 204 }, async ({ params, body, req, res }) => {
    await people.changeRole(ctx, auth, headers(req), rigOf(res), params.memberId, body.role, actorOf(res));
  }));

  router.delete('/members/:memberId', rigAccess(db, { people: ['manage'] }), handler({ params: memberParamsSchema, status: 204 }, async ({ params, req, res }) => {
    await people.removePerson(ctx, auth, headers(req), rigOf(res), params.memberId, actorOf(res));
  }));

  router.post('/leave', rigAccess(db, { rig: ['read'] }), handler({ status: 204 }, async ({ req, res }) => {
    const rig = rigOf(res);
    await people.leave(ctx, auth, headers(req), rig, rig.role, actorOf(res));
  }));

  return router;
}
