import { Router } from 'express';

import { unsubscribedSchema, unsubscribeQuerySchema } from '@/shared/api/email';
import type { AppContext } from '../context';
import { esc } from '../emails/escape';
import { LIST_NAME } from '../emails/unsubscribe';
import { handler } from '../http/handler';
import { unsubscribe } from '../services/email-prefs';

const title = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * /api/email/unsubscribe: open, no sign-in; the signed token says who and which e-mails.
 * GET is the link in the e-mail (one click, answers a small page); POST is RFC 8058's one-click from
 * the List-Unsubscribe header (answers JSON).
 */
export function emailRouter({ db, config }: AppContext) {
  const router = Router();
  const handle = (token: string) => unsubscribe(db, config.AUTH_SECRET, token);
  router.get('/unsubscribe', handler({ query: unsubscribeQuerySchema }, async ({ query, res }) => {
    const who = await handle(query.token);
    res.type('html').send(`<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>Keyoff: e-mails turned off</title></head>
<body style="font-family:Nunito,Segoe UI,Helvetica,Arial,sans-serif;background:#F6F3EC;color:#1C2630;padding:32px;max-width:560px;margin:auto">
<h1 style="font-size:22px">${esc(title(LIST_NAME[who.list]))} are off</h1>
<p>You will get no more ${esc(LIST_NAME[who.list])} from Keyoff. You can turn them back on in <a href="${esc(config.KEYOFF_URL)}/settings">Settings</a>.</p></body></html>`);
  }));
  router.post('/unsubscribe', handler({ query: unsubscribeQuerySchema, response: unsubscribedSchema }, async ({ query }) => {
    const who = await handle(query.token);
    return { list: who.list, on: false as const };
  }));
  return router;
}
