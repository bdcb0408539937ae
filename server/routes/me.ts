import { Router } from 'express';

import type { AppContext } from '../context';
import { session } from '../middleware/session';
import { householdsOfUser } from '../repositories/rigs';
import { emailPrefsSchema } from '@/shared/schemas/email-prefs';
import { handler } from '../http/handler';
import { prefsOf, savePrefs } from '../services/email-prefs';
import { unitsSchema } from '@/shared/schemas/units';
import { saveUnits, unitsOf } from '../services/units';

/** /api/me: who is signed in, with their account role, households and units. */
export function meRouter({ db }: AppContext) {
  const router = Router();
  router.get('/', async (_req, res) => {
    const { user } = session(res);
    res.json({
      user: { id: user.id, name: user.name, email: user.email, role: user.role ?? 'traveller' },
      households: await householdsOfUser(db, user.id),
      units: await unitsOf(db, user.id),
    });
  });
  // The energy unit on the account: the e-mails state their figures in it, and a signed-in device takes it.
  router.put('/units', handler({ body: unitsSchema }, async ({ body, res }) => {
    res.json(await saveUnits(db, session(res).user.id, body));
  }));
  router.get('/email-prefs', async (_req, res) => {
    res.json(await prefsOf(db, session(res).user.id));
  });
  router.put('/email-prefs', handler({ body: emailPrefsSchema }, async ({ body, res }) => {
    res.json(await savePrefs(db, session(res).user.id, body));
  }));
  return router;
}
