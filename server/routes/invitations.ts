import { Router } from 'express';
import { fromNodeHeaders } from 'better-auth/node';

import { invitationIdParamsSchema } from '@/shared/schemas/people';
import type { AppContext } from '../context';
import { session } from '../middleware/session';
import { parsed, validate } from '../middleware/validate';
import { acceptInvitation, invitationForInvitee } from '../services/people';

/** /api/invitations: the invitee's side (after requireSession). */
export function invitationsRouter({ db, auth }: AppContext) {
  const router = Router();
  router.get('/:invitationId', validate(invitationIdParamsSchema, 'params'), async (_req, res) => {
    res.json(await invitationForInvitee(db, parsed(res, invitationIdParamsSchema, 'params').invitationId, session(res).user.email));
  });
  router.post('/:invitationId/accept', validate(invitationIdParamsSchema, 'params'), async (req, res) => {
    await acceptInvitation(db, auth, fromNodeHeaders(req.headers), parsed(res, invitationIdParamsSchema, 'params').invitationId, session(res).user.email, { id: session(res).user.id, name: session(res).user.name });
    res.status(204).end();
  });
  return router;
}
