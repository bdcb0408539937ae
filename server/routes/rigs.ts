import { Router } from 'express';
import { fromNodeHeaders } from 'better-auth/node';

import { invitationCreateSchema, invitationParamsSchema, memberParamsSchema, memberRoleSchema } from '@/shared/schemas/people';
import { rigCreateSchema } from '@/shared/schemas/rig';
import type { AppContext } from '../context';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { session } from '../middleware/session';
import { parsed, validate } from '../middleware/validate';
import { loadsOfRigs } from '../repositories/rigs';
import * as people from '../services/people';
import { createRig, listRigs, loadFromRow, rigDto } from '../services/rigs';

/** /api/rigs: every route below runs after requireSession (app.ts) and one rigAccess check. */
export function rigsRouter({ db, auth }: AppContext) {
  const router = Router();
  const headers = (req: { headers: Record<string, string | string[] | undefined> }) => fromNodeHeaders(req.headers);

  router.get('/', async (_req, res) => {
    res.json({ rigs: await listRigs(db, session(res).user.id) });
  });

  router.post('/', validate(rigCreateSchema), async (_req, res) => {
    const id = await createRig(db, auth, session(res).user.id, parsed(res, rigCreateSchema));
    res.status(201).location(`/api/rigs/${id}`).json({ id });
  });

  router.get('/:rigId', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    const rig = rigOf(res);
    const loads = (await loadsOfRigs(db, [rig.id])).map(loadFromRow);
    res.json(rigDto(rig, loads));
  });

  router.get('/:rigId/people', rigAccess(db, { people: ['read'] }), async (_req, res) => {
    res.json(await people.listPeople(db, rigOf(res).household_id));
  });

  router.post('/:rigId/invitations', rigAccess(db, { people: ['manage'] }), validate(invitationCreateSchema), async (req, res) => {
    const body = parsed(res, invitationCreateSchema);
    res.status(201).json(await people.invite(auth, headers(req), rigOf(res).household_id, body.email, body.role));
  });

  router.post('/:rigId/invitations/:invitationId/resend', rigAccess(db, { people: ['manage'] }), validate(invitationParamsSchema, 'params'), async (req, res) => {
    res.json(await people.resendInvitation(db, auth, headers(req), rigOf(res).household_id, parsed(res, invitationParamsSchema, 'params').invitationId));
  });

  router.delete('/:rigId/invitations/:invitationId', rigAccess(db, { people: ['manage'] }), validate(invitationParamsSchema, 'params'), async (req, res) => {
    await people.revokeInvitation(db, auth, headers(req), rigOf(res).household_id, parsed(res, invitationParamsSchema, 'params').invitationId);
    res.status(204).end();
  });

  router.patch('/:rigId/members/:memberId', rigAccess(db, { people: ['manage'] }), validate(memberParamsSchema, 'params'), validate(memberRoleSchema), async (req, res) => {
    const { memberId } = parsed(res, memberParamsSchema, 'params');
    await people.changeRole(db, auth, headers(req), rigOf(res).household_id, memberId, parsed(res, memberRoleSchema).role);
    res.status(204).end();
  });

  router.delete('/:rigId/members/:memberId', rigAccess(db, { people: ['manage'] }), validate(memberParamsSchema, 'params'), async (req, res) => {
    await people.removePerson(db, auth, headers(req), rigOf(res).household_id, parsed(res, memberParamsSchema, 'params').memberId);
    res.status(204).end();
  });

  router.post('/:rigId/leave', rigAccess(db, { rig: ['read'] }), async (req, res) => {
    const rig = rigOf(res);
    await people.leave(db, auth, headers(req), rig.household_id, rig.role);
    res.status(204).end();
  });

  return router;
}
