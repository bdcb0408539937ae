import { z } from 'zod';

import { accountRoleSchema } from '../schemas/people';

export { accountRoleBodySchema, userParamsSchema } from '../schemas/people';

export const accountSchema = z.strictObject({ id: z.string(), name: z.string(), email: z.string(), role: accountRoleSchema, emailVerified: z.boolean() });
export type Account = z.infer<typeof accountSchema>;
export type AccountRole = z.infer<typeof accountRoleSchema>;

/** GET /api/admin/users */
export const accountListSchema = z.strictObject({ users: z.array(accountSchema) });
export type AccountList = z.infer<typeof accountListSchema>;

/** An e-mail whose last attempt failed, with the error; no budget figures. */
export const emailFailureSchema = z.strictObject({ id: z.string(), kind: z.string(), key: z.string(), attempts: z.number().int(), error: z.string().nullable(), to: z.string().nullable(), createdAt: z.iso.datetime() });
export type EmailFailure = z.infer<typeof emailFailureSchema>;

/** GET /api/admin/email-failures */
export const emailFailureListSchema = z.strictObject({ failures: z.array(emailFailureSchema) });
export type EmailFailureList = z.infer<typeof emailFailureListSchema>;
