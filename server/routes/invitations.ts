import { Router } from 'express';
import { fromNodeHeaders } from 'better-auth/node';

import { invitationIdParamsSchema, invitationViewSchema } from '@/shared/api/people';
import type { AppContext } from '../context';
import { actorOf, session } from '../middleware/session';
import { handler } from '../http/handler';
import { acceptInvitation, invitationForInvitee } from '../services/people';

/** /api/invitations: the invitee's side (after requireSession). */
export function invitationsRouter({ db, auth }: AppContext) {
  const router = Router();
  router.get('/:invitationId', handler({ params: invitationIdParamsSchema, response: invitationViewSchema }, ({ params, res }) =>
    invitationForInvitee(db, params.invitationId, session(res).user.email)));
  router.post('/:invitationId/accept', handler({ params: invitationIdParamsSchema, status: 204 }, async ({ params, req, res }) => {
    await acceptInvitation(db, auth, fromNodeHeaders(req.headers), params.invitationId, session(res).user.email, actorOf(res));
  }));
  return router;
}
