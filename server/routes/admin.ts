import { Router } from 'express';
import { fromNodeHeaders } from 'better-auth/node';

import { accountListSchema, accountRoleBodySchema, emailFailureListSchema, userParamsSchema } from '@/shared/api/admin';
import { accountRoleOf } from '@/shared/schemas/people';
import { viaAuth } from '../auth-errors';
import type { AppContext } from '../context';
import { forgetCachedSessions, requireAdmin } from '../middleware/session';
import { handler } from '../http/handler';
import { failedEmails } from '../services/reports';

/** /api/admin: account roles. An admin sees accounts, never a budget they were not invited to. */
export function adminRouter({ auth, db }: AppContext) {
  const router = Router();
  router.use(requireAdmin);
  router.get('/users', handler({ response: accountListSchema }, async ({ req }) => {
    const result = await viaAuth(() => auth.api.listUsers({ headers: fromNodeHeaders(req.headers), query: { limit: 200, sortBy: 'createdAt' } }));
    return { users: result.users.map((u) => ({ id: u.id, name: u.name, email: u.email, role: accountRoleOf(u.role), emailVerified: u.emailVerified })) };
  }));
  router.put('/users/:userId/role', handler({ params: userParamsSchema, body: accountRoleBodySchema, status: 204 }, async ({ params: { userId }, body, req }) => {
    await viaAuth(() => auth.api.setRole({ headers: fromNodeHeaders(req.headers), body: { userId, role: body.role } }), 'role');
    // The account's sessions carry its role: the next read looks them up again.
    forgetCachedSessions();
  }));
  // E-mails that failed to render or send (pg-boss retries them; the last error stays here until one works).
  router.get('/email-failures', handler({ response: emailFailureListSchema }, async () => ({ failures: await failedEmails(db) })));
  return router;
}
