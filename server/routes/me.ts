import { Router } from 'express';

import type { AppContext } from '../context';
import { session } from '../middleware/session';
import { emailPrefsSchema, meSchema, savedEmailPrefsSchema, savedUnitsSchema, unitsSchema } from '@/shared/api/me';
import { accountRoleOf } from '@/shared/schemas/people';
import { handler } from '../http/handler';
import { householdsOfUser } from '../repositories/rigs';
import { prefsOf, savePrefs } from '../services/email-prefs';
import { saveUnits, unitsOf } from '../services/units';

/** /api/me: who is signed in, with their account role, households and units. */
export function meRouter({ db }: AppContext) {
  const router = Router();
  router.get('/', handler({ response: meSchema }, async ({ res }) => {
    const { user } = session(res);
    return {
      user: { id: user.id, name: user.name, email: user.email, role: accountRoleOf(user.role) },
      households: await householdsOfUser(db, user.id),
      units: await unitsOf(db, user.id),
    };
  }));
  // The energy unit on the account: the e-mails state their figures in it, and a signed-in device takes it.
  router.put('/units', handler({ body: unitsSchema, response: savedUnitsSchema }, ({ body, res }) => saveUnits(db, session(res).user.id, body)));
  router.get('/email-prefs', handler({ response: savedEmailPrefsSchema }, ({ res }) => prefsOf(db, session(res).user.id)));
  router.put('/email-prefs', handler({ body: emailPrefsSchema, response: savedEmailPrefsSchema }, ({ body, res }) => savePrefs(db, session(res).user.id, body)));
  return router;
}
