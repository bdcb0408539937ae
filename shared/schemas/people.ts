import { z } from 'zod';

import './error-map';

export const householdRoleSchema = z.enum(['owner', 'member', 'advisor']);
export const accountRoleSchema = z.enum(['traveller', 'advisor', 'admin']);
/** An account's role as better-auth stores it (a free string, none for a new account), read as one of ours. */
export const accountRoleOf = (stored: string | null | undefined) => accountRoleSchema.catch('traveller').parse(stored);

export const invitationCreateSchema = z.strictObject({
  email: z.email('Enter an e-mail address.').max(254).transform((e) => e.toLowerCase()),
  role: householdRoleSchema.default('member'),
});
export type InvitationCreateForm = z.input<typeof invitationCreateSchema>;

export const memberRoleSchema = z.strictObject({ role: householdRoleSchema });
export const memberParamsSchema = z.object({ rigId: z.uuid(), memberId: z.string().min(1).max(64) });
export const invitationParamsSchema = z.object({ rigId: z.uuid(), invitationId: z.string().min(1).max(64) });
export const invitationIdParamsSchema = z.object({ invitationId: z.string().min(1).max(64) });
export const accountRoleBodySchema = z.strictObject({ role: accountRoleSchema });
export const userParamsSchema = z.object({ userId: z.string().min(1).max(64) });
