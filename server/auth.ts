import { betterAuth } from 'better-auth';
import { APIError, createAuthMiddleware } from 'better-auth/api';
import { admin, organization } from 'better-auth/plugins';
import type { Logger } from 'pino';

import type { Db } from '@/db/client';
import { accountAc, accountRoles, householdAc, householdRoles } from '@/shared/permissions';
import { NAME_MAX } from '@/shared/schemas/auth';
import type { Config } from './config';
import { type Mail, type Mailer, templates } from './mail';

/** The header the server sets from the socket before the auth handler, so its rate limit sees the real client. */
export const CLIENT_IP_HEADER = 'x-keyoff-client-ip';

export const INVITATION_DAYS = 7;

/**
 * better-auth on the app's own Kysely instance: e-mail and password with verification and reset,
 * account roles (admin plugin: traveller, advisor, admin) and households (organization plugin: owner,
 * member, advisor).
 */
/** Names of people and households: the forms' limit, kept on every better-auth route too (a name travels in the session cookie and in e-mail subjects). */
const capNames = createAuthMiddleware(async (ctx) => {
  const body = ctx.body as { name?: unknown; data?: { name?: unknown } } | undefined;
  for (const [field, value] of [['name', body?.name], ['data.name', body?.data?.name]] as const) {
    if (typeof value === 'string' && value.length > NAME_MAX) {
      throw new APIError('BAD_REQUEST', { message: `${field}: use at most ${NAME_MAX} characters.`, code: 'NAME_TOO_LONG' });
    }
  }
});

export function createAuth({ config, db, mailer, logger, retryMail, queueMail }: { config: Config; db: Db; mailer: Mailer; logger: Logger; retryMail?: (mail: Mail) => Promise<void>; queueMail?: (mail: Mail) => Promise<void> }) {
  // Account e-mails go out at once (someone is waiting for the link); when the SMTP server fails, the
  // mail goes to the job queue, which retries it with backoff. The request itself succeeds either way.
  const send = async (mail: Mail) => {
    try {
      await mailer.send(mail);
    } catch (err) {
      logger.error({ err, to: mail.to }, 'mail could not be sent; queued for retry');
      await retryMail?.(mail).catch((queueErr) => logger.error({ err: queueErr, to: mail.to }, 'mail could not be queued either'));
    }
  };

  // The reset e-mail goes out from the job queue: answering for a known address then costs what answering
  // for an unknown one costs (a row or two), so the time taken tells nothing about which accounts exist.
  const sendLater = async (mail: Mail) => {
    try {
      if (!queueMail) throw new Error('no job queue');
      await queueMail(mail);
    } catch (err) {
      logger.error({ err, to: mail.to }, 'mail could not be queued; sending at once');
      await send(mail);
    }
  };

  return betterAuth({
    appName: 'Keyoff',
    baseURL: config.KEYOFF_URL,
    basePath: '/api/auth',
    secret: config.AUTH_SECRET,
    database: { db, type: 'postgres' },
    trustedOrigins: [config.KEYOFF_URL, ...config.TRUSTED_ORIGINS],
    emailAndPassword: {
      enabled: true,
      requireEmailVerification: true,
      minPasswordLength: 10,
      maxPasswordLength: 128,
      resetPasswordTokenExpiresIn: 3600,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user, url }) => sendLater(templates.resetPassword(user.email, user.name, url)),
    },
    emailVerification: {
      sendOnSignUp: true,
      autoSignInAfterVerification: true,
      expiresIn: 24 * 3600,
      sendVerificationEmail: async ({ user, url }) => send(templates.verifyEmail(user.email, user.name, url)),
    },
    // Our routes check the session in the database (requireSession); the signed cache serves get-session only, briefly.
    session: { cookieCache: { enabled: true, maxAge: 5 } },
    hooks: { before: capNames },
    rateLimit: {
      enabled: true,
      window: 60,
      max: 300,
      storage: 'memory',
      customRules: {
        '/sign-in/email': { window: 60, max: config.SIGN_IN_LIMIT_PER_MINUTE },
        '/sign-up/email': { window: 60, max: config.SIGN_IN_LIMIT_PER_MINUTE },
        '/request-password-reset': { window: 60, max: config.SIGN_IN_LIMIT_PER_MINUTE },
      },
    },
    advanced: {
      // Under vitest NODE_ENV=test silently switches the origin check off; keep it on everywhere.
      disableOriginCheck: false,
      ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
      useSecureCookies: config.KEYOFF_URL.startsWith('https://'),
    },
    databaseHooks: {
      user: {
        create: {
          // The first admins come from the configuration.
          before: async (user) => (config.ADMIN_EMAILS.includes(user.email.toLowerCase()) ? { data: { ...user, role: 'admin' } } : { data: user }),
        },
      },
    },
    plugins: [
      admin({ ac: accountAc, roles: accountRoles, defaultRole: 'traveller', adminRoles: ['admin'] }),
      organization({
        ac: householdAc,
        roles: householdRoles,
        creatorRole: 'owner',
        invitationExpiresIn: INVITATION_DAYS * 24 * 3600,
        cancelPendingInvitationsOnReInvite: true,
        requireEmailVerificationOnInvitation: true,
        sendInvitationEmail: async ({ id, email, role, organization: household, inviter }) =>
          send(templates.invitation(email, inviter.user.name, household.name, role, `${config.KEYOFF_URL}/invitations/${id}`)),
      }),
    ],
  });
}

export type Auth = ReturnType<typeof createAuth>;
