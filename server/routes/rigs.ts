import { type Response, Router } from 'express';
import { fromNodeHeaders } from 'better-auth/node';

import { invitationCreateSchema, invitationParamsSchema, memberParamsSchema, memberRoleSchema } from '@/shared/schemas/people';
import { cableRunParamsSchema, cableRunSchema } from '@/shared/schemas/cable-run';
import { noteCreateSchema, noteEditSchema, noteParamsSchema } from '@/shared/schemas/note';
import { loadSchema } from '@/shared/schemas/projection';
import { loadParamsSchema, rigCreateSchema, rigUpdateSchema, sheetQuerySchema, tryLoadsSchema } from '@/shared/schemas/rig';
import type { AppContext } from '../context';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { session } from '../middleware/session';
import { parsed, validate } from '../middleware/validate';
import * as people from '../services/people';
import * as cableRuns from '../services/cable-runs';
import { rigHookup } from '../services/hookup';
import { applyFix, previewFix, undoFix } from '../services/fixes';
import { fixApplySchema, fixPreviewSchema, historyEntryParamsSchema } from '@/shared/schemas/fix';
import { rigHookupQuerySchema } from '@/shared/schemas/hookup';
import * as notes from '../services/notes';
import * as rigs from '../services/rigs';
import * as reports from '../services/reports';
import { budgetSheet } from '../services/sheet';
import { historyOf } from '../services/history';
import { noteRecipients } from '../jobs/notes';
import { HttpError } from '../errors';
import { emailParamsSchema } from '@/shared/schemas/email-prefs';

/** /api/rigs: every route below runs after requireSession (app.ts) and one rigAccess check. */
export function rigsRouter({ db, auth, jobs, config, storage }: AppContext) {
  const router = Router();
  const actor = (res: Response) => ({ id: session(res).user.id, name: session(res).user.name });

  // After a change that can move the forecast, the rig's margin is checked (low-margin warnings); a save
  // that changed nothing (res.locals.unchanged) queues no check.
  router.use('/:rigId', (req, res, next) => {
    if (req.method !== 'GET' && !/\/(notes|try|fixes\/preview)(\/|$)/.test(req.path)) {
      res.on('finish', () => {
        if (res.statusCode < 300 && !res.locals.unchanged && typeof req.params.rigId === 'string') void jobs.rigChanged(req.params.rigId);
      });
    }
    next();
  });
  const inviteLimits = { perInviterPerHour: config.INVITES_PER_INVITER_PER_HOUR, perHouseholdPerDay: config.INVITES_PER_HOUSEHOLD_PER_DAY };
  const headers = (req: { headers: Record<string, string | string[] | undefined> }) => fromNodeHeaders(req.headers);

  router.get('/', async (_req, res) => {
    res.json({ rigs: await rigs.listRigs(db, session(res).user.id) });
  });

  router.post('/', validate(rigCreateSchema), async (_req, res) => {
    const id = await rigs.createRig(db, auth, actor(res), parsed(res, rigCreateSchema));
    res.status(201).location(`/api/rigs/${id}`).json({ id });
  });

  router.get('/:rigId', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json(await rigs.readRig(db, rigOf(res)));
  });

  router.patch('/:rigId', rigAccess(db, { rig: ['update'] }), validate(rigUpdateSchema), async (_req, res) => {
    const { changed, ...rig } = await rigs.changeRig(db, rigOf(res), actor(res), parsed(res, rigUpdateSchema));
    res.locals.unchanged = !changed;
    res.json(rig);
  });

  router.delete('/:rigId', rigAccess(db, { rig: ['delete'] }), async (req, res) => {
    const left = await rigs.removeRig(db, storage, rigOf(res).id);
    if (left.length) req.log.error({ keys: left }, 'objects of a deleted rig are still in the store');
    res.status(204).end();
  });

  router.get('/:rigId/outlook', rigAccess(db, { rig: ['read'] }), async (req, res) => {
    const body = await rigs.rigOutlook(db, rigOf(res));
    // Never stored (private data); a client that kept the answer itself may still ask with its tag (304). Gzip when the client takes it.
    res.set({ ETag: body.etag, 'Cache-Control': 'no-store', Vary: 'Accept-Encoding' });
    if (req.fresh) return res.status(304).end();
    res.type('json');
    if (req.acceptsEncodings('gzip', 'identity') === 'gzip') return res.set('Content-Encoding', 'gzip').send(body.gzip);
    res.send(body.json);
  });

  // The budget sheet: household only, like the Outlook it is made from.
  router.get('/:rigId/sheet.pdf', rigAccess(db, { rig: ['read'] }), validate(sheetQuerySchema, 'query'), async (_req, res) => {
    const { pdf, filename } = await budgetSheet(db, rigOf(res), parsed(res, sheetQuerySchema, 'query').size);
    res.set({ 'Content-Disposition': `attachment; filename="${filename}"`, 'Cache-Control': 'private, no-store' }).type('pdf').send(pdf);
  });

  router.post('/:rigId/try', rigAccess(db, { rig: ['read'] }), validate(tryLoadsSchema), async (_req, res) => {
    res.json(await rigs.tryLoads(db, rigOf(res), parsed(res, tryLoadsSchema).candidates));
  });

  router.post('/:rigId/loads', rigAccess(db, { load: ['create'] }), validate(loadSchema), async (_req, res) => {
    res.status(201).json(await rigs.addLoad(db, rigOf(res), actor(res), parsed(res, loadSchema)));
  });

  // Members pass with update-own; the service refuses a load someone else added unless the role has update-any.
  router.patch('/:rigId/loads/:loadId', rigAccess(db, { load: ['update-own'] }), validate(loadParamsSchema, 'params'), validate(loadSchema), async (_req, res) => {
    const { load, changed } = await rigs.editLoad(db, rigOf(res), actor(res), parsed(res, loadParamsSchema, 'params').loadId, parsed(res, loadSchema));
    res.locals.unchanged = !changed;
    res.json(load);
  });

  router.delete('/:rigId/loads/:loadId', rigAccess(db, { load: ['delete-own'] }), validate(loadParamsSchema, 'params'), async (_req, res) => {
    await rigs.removeLoad(db, rigOf(res), actor(res), parsed(res, loadParamsSchema, 'params').loadId);
    res.status(204).end();
  });

  router.get('/:rigId/cable-runs', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json({ cableRuns: await cableRuns.cableRunsOf(db, rigOf(res)) });
  });

  router.post('/:rigId/cable-runs', rigAccess(db, { cableRun: ['create'] }), validate(cableRunSchema), async (_req, res) => {
    res.status(201).json(await cableRuns.addCableRun(db, rigOf(res), actor(res), parsed(res, cableRunSchema)));
  });

  router.patch('/:rigId/cable-runs/:runId', rigAccess(db, { cableRun: ['update'] }), validate(cableRunParamsSchema, 'params'), validate(cableRunSchema), async (_req, res) => {
    res.json(await cableRuns.editCableRun(db, rigOf(res), actor(res), parsed(res, cableRunParamsSchema, 'params').runId, parsed(res, cableRunSchema)));
  });

  router.delete('/:rigId/cable-runs/:runId', rigAccess(db, { cableRun: ['delete'] }), validate(cableRunParamsSchema, 'params'), async (_req, res) => {
    await cableRuns.removeCableRun(db, rigOf(res), actor(res), parsed(res, cableRunParamsSchema, 'params').runId);
    res.status(204).end();
  });

  router.get('/:rigId/hookup', rigAccess(db, { rig: ['read'] }), validate(rigHookupQuerySchema, 'query'), async (_req, res) => {
    res.json(await rigHookup(db, rigOf(res), parsed(res, rigHookupQuerySchema, 'query')));
  });

  router.post('/:rigId/fixes/preview', rigAccess(db, { rig: ['read'] }), validate(fixPreviewSchema), async (_req, res) => {
    res.json(await previewFix(db, rigOf(res), parsed(res, fixPreviewSchema).kind));
  });

  router.post('/:rigId/fixes/apply', rigAccess(db, { rig: ['update'] }), validate(fixApplySchema), async (_req, res) => {
    const { kind, version } = parsed(res, fixApplySchema);
    res.json(await applyFix(db, rigOf(res), actor(res), kind, version));
  });

  router.post('/:rigId/history/:entryId/undo', rigAccess(db, { rig: ['update'] }), validate(historyEntryParamsSchema, 'params'), async (_req, res) => {
    res.json(await undoFix(db, rigOf(res), actor(res), parsed(res, historyEntryParamsSchema, 'params').entryId));
  });

  router.get('/:rigId/notes', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json(await notes.notesOf(db, rigOf(res), session(res).user.id));
  });

  router.post('/:rigId/notes', rigAccess(db, { note: ['create'] }), validate(noteCreateSchema), async (_req, res) => {
    const rig = rigOf(res);
    const id = await notes.addNote(db, rig, session(res).user.id, parsed(res, noteCreateSchema));
    await jobs.noteWritten(rig.id, await noteRecipients({ db }, rig.household_id, session(res).user.id));
    res.status(201).json({ id });
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

  router.get('/:rigId/history', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json({ history: await historyOf(db, rigOf(res).id) });
  });

  router.get('/:rigId/emails', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json({ emails: await reports.sentEmailsOf(db, rigOf(res).id) });
  });

  // The e-mail as it was sent, for the Reports screen's frame: its own strict policy, no scripts.
  router.get('/:rigId/emails/:emailId', rigAccess(db, { rig: ['read'] }), validate(emailParamsSchema, 'params'), async (_req, res) => {
    const { rigId, emailId } = parsed(res, emailParamsSchema, 'params');
    const mail = await reports.sentEmail(db, rigId, emailId);
    res
      .set('Content-Security-Policy', "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; frame-ancestors 'self' " + config.TRUSTED_ORIGINS.join(' '))
      .type('html')
      .send((mail.html ?? '').replaceAll('cid:week-ahead', `/api/rigs/${rigId}/emails/${emailId}/chart.png`));
  });

  // The next weekly report, previewed (nothing is sent): a strict policy like a sent one, its chart inline.
  router.get('/:rigId/report-preview', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    const html = await reports.reportPreview(db, config, rigOf(res), actor(res));
    res
      .set({ 'Content-Security-Policy': "default-src 'none'; img-src data:; style-src 'unsafe-inline'; frame-ancestors 'self' " + config.TRUSTED_ORIGINS.join(' '), 'Cache-Control': 'private, no-store' })
      .type('html')
      .send(html);
  });

  router.get('/:rigId/emails/:emailId/chart.png', rigAccess(db, { rig: ['read'] }), validate(emailParamsSchema, 'params'), async (_req, res) => {
    const { rigId, emailId } = parsed(res, emailParamsSchema, 'params');
    const mail = await reports.sentEmail(db, rigId, emailId);
    if (!mail.chart_png) throw new HttpError(404, 'not_found', 'This e-mail has no chart.');
    res.type('png').send(mail.chart_png);
  });

  router.get('/:rigId/people', rigAccess(db, { people: ['read'] }), async (_req, res) => {
    res.json(await people.listPeople(db, rigOf(res).household_id));
  });

  router.post('/:rigId/invitations', rigAccess(db, { people: ['manage'] }), validate(invitationCreateSchema), async (req, res) => {
    const body = parsed(res, invitationCreateSchema);
    res.status(201).json(await people.invite(db, auth, headers(req), session(res).user.id, inviteLimits, rigOf(res).household_id, body.email, body.role));
  });

  router.post('/:rigId/invitations/:invitationId/resend', rigAccess(db, { people: ['manage'] }), validate(invitationParamsSchema, 'params'), async (req, res) => {
    res.json(await people.resendInvitation(db, auth, headers(req), session(res).user.id, inviteLimits, rigOf(res).household_id, parsed(res, invitationParamsSchema, 'params').invitationId));
  });

  router.delete('/:rigId/invitations/:invitationId', rigAccess(db, { people: ['manage'] }), validate(invitationParamsSchema, 'params'), async (req, res) => {
    await people.revokeInvitation(db, auth, headers(req), rigOf(res).household_id, parsed(res, invitationParamsSchema, 'params').invitationId);
    res.status(204).end();
  });

  router.patch('/:rigId/members/:memberId', rigAccess(db, { people: ['manage'] }), validate(memberParamsSchema, 'params'), validate(memberRoleSchema), async (req, res) => {
    const { memberId } = parsed(res, memberParamsSchema, 'params');
    await people.changeRole(db, auth, headers(req), rigOf(res).household_id, memberId, parsed(res, memberRoleSchema).role, actor(res));
    res.status(204).end();
  });

  router.delete('/:rigId/members/:memberId', rigAccess(db, { people: ['manage'] }), validate(memberParamsSchema, 'params'), async (req, res) => {
    await people.removePerson(db, auth, headers(req), rigOf(res).household_id, parsed(res, memberParamsSchema, 'params').memberId, actor(res));
    res.status(204).end();
  });

  router.post('/:rigId/leave', rigAccess(db, { rig: ['read'] }), async (req, res) => {
    const rig = rigOf(res);
    await people.leave(db, auth, headers(req), rig.household_id, rig.role, actor(res));
    res.status(204).end();
  });

  return router;
}
