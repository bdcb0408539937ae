import { Router } from 'express';

import { emailParamsSchema, sentEmailListSchema } from '@/shared/api/reports';
import { sheetQuerySchema } from '@/shared/api/rigs';
import type { AppContext } from '../context';
import { HttpError } from '../errors';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { actorOf } from '../middleware/session';
import * as reports from '../services/reports';
import { budgetSheet } from '../services/sheet';
import { unitsOf } from '../services/units';

/** /api/rigs/:rigId: what the rig's household reads or prints: the budget sheet, the e-mails sent, the next report. */
export function reportsRouter({ db, config }: AppContext) {
  const router = Router({ mergeParams: true });

  // The budget sheet: household only, like the Outlook it is made from.
  router.get('/sheet.pdf', rigAccess(db, { rig: ['read'] }), handler({ query: sheetQuerySchema }, async ({ query, res }) => {
    const { energy } = await unitsOf(db, actorOf(res).id);
    const { pdf, filename } = await budgetSheet(db, rigOf(res), query.size, energy);
    res.set({ 'Content-Disposition': `attachment; filename="${filename}"`, 'Cache-Control': 'private, no-store' }).type('pdf').send(pdf);
  }));

  router.get('/emails', rigAccess(db, { rig: ['read'] }), handler({ response: sentEmailListSchema }, async ({ res }) => ({ emails: await reports.sentEmailsOf(db, rigOf(res).id) })));

  // The e-mail as it was sent, for the Reports screen's frame: its own strict policy, no scripts.
  router.get('/emails/:emailId', rigAccess(db, { rig: ['read'] }), handler({ params: emailParamsSchema }, async ({ params: { rigId, emailId }, res }) => {
    const mail = await reports.sentEmail(db, rigId, emailId);
    res
      .set('Content-Security-Policy', "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; frame-ancestors 'self' " + config.TRUSTED_ORIGINS.join(' '))
      .type('html')
      .send((mail.html ?? '').replaceAll('cid:week-ahead', `/api/rigs/${rigId}/emails/${emailId}/chart.png`));
  }));

  // The next weekly report, previewed (nothing is sent): a strict policy like a sent one, its chart inline.
  router.get('/report-preview', rigAccess(db, { rig: ['read'] }), handler({}, async ({ res }) => {
    const html = await reports.reportPreview(db, config, rigOf(res), actorOf(res));
    res
      .set({ 'Content-Security-Policy': "default-src 'none'; img-src data:; style-src 'unsafe-inline'; frame-ancestors 'self' " + config.TRUSTED_ORIGINS.join(' '), 'Cache-Control': 'private, no-store' })
      .type('html')
      .send(html);
  }));

  router.get('/emails/:emailId/chart.png', rigAccess(db, { rig: ['read'] }), handler({ params: emailParamsSchema }, async ({ params: { rigId, emailId }, res }) => {
    const mail = await reports.sentEmail(db, rigId, emailId);
    if (!mail.chart_png) throw new HttpError(404, 'not_found', 'This e-mail has no chart.');
    res.type('png').send(mail.chart_png);
  }));

  return router;
}
