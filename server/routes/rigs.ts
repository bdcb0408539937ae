import { Router } from 'express';
import { fromNodeHeaders } from 'better-auth/node';

import { invitationCreateSchema, invitationParamsSchema, memberParamsSchema, memberRoleSchema } from '@/shared/schemas/people';
import { cableRunParamsSchema, cableRunSchema } from '@/shared/schemas/cable-run';
import { noteCreateSchema, noteEditSchema, noteParamsSchema } from '@/shared/schemas/note';
import { loadSchema } from '@/shared/schemas/projection';
import { loadParamsSchema, rigCreateSchema, rigUpdateSchema, tryLoadsSchema } from '@/shared/schemas/rig';
import type { AppContext } from '../context';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { session } from '../middleware/session';
import { parsed, validate } from '../middleware/validate';
import * as people from '../services/people';
import * as cableRuns from '../services/cable-runs';
import * as notes from '../services/notes';
import * as rigs from '../services/rigs';

/** /api/rigs: every route below runs after requireSession (app.ts) and one rigAccess check. */
export function rigsRouter({ db, auth }: AppContext) {
  const router = Router();
  const headers = (req: { headers: Record<string, string | string[] | undefined> }) => fromNodeHeaders(req.headers);

  router.get('/', async (_req, res) => {
    res.json({ rigs: await rigs.listRigs(db, session(res).user.id) });
  });

  router.post('/', validate(rigCreateSchema), async (_req, res) => {
    const id = await rigs.createRig(db, auth, session(res).user.id, parsed(res, rigCreateSchema));
    res.status(201).location(`/api/rigs/${id}`).json({ id });
  });

  router.get('/:rigId', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json(await rigs.readRig(db, rigOf(res)));
  });

  router.patch('/:rigId', rigAccess(db, { rig: ['update'] }), validate(rigUpdateSchema), async (_req, res) => {
    res.json(await rigs.changeRig(db, rigOf(res), parsed(res, rigUpdateSchema)));
  });

  router.delete('/:rigId', rigAccess(db, { rig: ['delete'] }), async (_req, res) => {
    await rigs.removeRig(db, rigOf(res).id);
    res.status(204).end();
  });

  router.get('/:rigId/outlook', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json(await rigs.rigOutlook(db, rigOf(res)));
  });

  router.post('/:rigId/try', rigAccess(db, { rig: ['read'] }), validate(tryLoadsSchema), async (_req, res) => {
    res.json(await rigs.tryLoads(db, rigOf(res), parsed(res, tryLoadsSchema).candidates));
  });

  router.post('/:rigId/loads', rigAccess(db, { load: ['create'] }), validate(loadSchema), async (_req, res) => {
    res.status(201).json(await rigs.addLoad(db, rigOf(res), session(res).user.id, parsed(res, loadSchema)));
  });

  router.patch('/:rigId/loads/:loadId', rigAccess(db, { load: ['update'] }), validate(loadParamsSchema, 'params'), validate(loadSchema), async (_req, res) => {
    res.json(await rigs.editLoad(db, rigOf(res), parsed(res, loadParamsSchema, 'params').loadId, parsed(res, loadSchema)));
  });

  router.delete('/:rigId/loads/:loadId', rigAccess(db, { load: ['delete'] }), validate(loadParamsSchema, 'params'), async (_req, res) => {
    await rigs.removeLoad(db, rigOf(res).id, parsed(res, loadParamsSchema, 'params').loadId);
    res.status(204).end();
  });

  router.get('/:rigId/cable-runs', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json({ cableRuns: await cableRuns.cableRunsOf(db, rigOf(res)) });
  });

  router.post('/:rigId/cable-runs', rigAccess(db, { cableRun: ['create'] }), validate(cableRunSchema), async (_req, res) => {
    res.status(201).json(await cableRuns.addCableRun(db, rigOf(res), session(res).user.id, parsed(res, cableRunSchema)));
  });

  router.patch('/:rigId/cable-runs/:runId', rigAccess(db, { cableRun: ['update'] }), validate(cableRunParamsSchema, 'params'), validate(cableRunSchema), async (_req, res) => {
    res.json(await cableRuns.editCableRun(db, rigOf(res), parsed(res, cableRunParamsSchema, 'params').runId, parsed(res, cableRunSchema)));
  });

  router.delete('/:rigId/cable-runs/:runId', rigAccess(db, { cableRun: ['delete'] }), validate(cableRunParamsSchema, 'params'), async (_req, res) => {
    await cableRuns.removeCableRun(db, rigOf(res), parsed(res, cableRunParamsSchema, 'params').runId);
    res.status(204).end();
  });

  router.get('/:rigId/notes', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json(await notes.notesOf(db, rigOf(res), session(res).user.id));
  });

  router.post('/:rigId/notes', rigAccess(db, { note: ['create'] }), validate(noteCreateSchema), async (_req, res) => {
    res.status(201).json({ id: await notes.addNote(db, rigOf(res), session(res).user.id, parsed(res, noteCreateSchema)) });
  });

  router.post('/:rigId/notes/read', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    await notes.readNotes(db, rigOf(res), session(res).user.id);
    res.status(204).end();
  });

  router.patch('/:rigId/notes/:noteId', rigAccess(db, { note: ['create'] }), validate(noteParamsSchema, 'params'), validate(noteEditSchema), async (_req, res) => {
    await notes.editNote(db, rigOf(res), parsed(res, noteParamsSchema, 'params').noteId, session(res).user.id, parsed(res, noteEditSchema).body);
    res.status(204).end();
  });

  router.delete('/:rigId/notes/:noteId', rigAccess(db, { note: ['create'] }), validate(noteParamsSchema, 'params'), async (_req, res) => {
    await notes.removeNote(db, rigOf(res), parsed(res, noteParamsSchema, 'params').noteId, session(res).user.id);
    res.status(204).end();
  });

  router.post('/:rigId/notes/:noteId/resolve', rigAccess(db, { note: ['create'] }), validate(noteParamsSchema, 'params'), async (_req, res) => {
    await notes.resolveThread(db, rigOf(res), parsed(res, noteParamsSchema, 'params').noteId, true);
    res.status(204).end();
  });

  router.post('/:rigId/notes/:noteId/reopen', rigAccess(db, { note: ['create'] }), validate(noteParamsSchema, 'params'), async (_req, res) => {
    await notes.resolveThread(db, rigOf(res), parsed(res, noteParamsSchema, 'params').noteId, false);
    res.status(204).end();
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
