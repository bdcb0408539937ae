import { z } from 'zod';

export { invitationCreateSchema, invitationIdParamsSchema, invitationParamsSchema, memberParamsSchema, memberRoleSchema } from '../schemas/people';

// better-auth keeps roles as text (a member may hold several, comma-separated): sent as stored.
export const personSchema = z.strictObject({ id: z.string(), userId: z.string(), role: z.string(), joinedAt: z.iso.datetime(), name: z.string(), email: z.string() });
export type Person = z.infer<typeof personSchema>;
export const pendingInvitationSchema = z.strictObject({
  id: z.string(),
  email: z.string(),
  role: z.string().nullable(),
  status: z.string(),
  expiresAt: z.iso.datetime(),
  createdAt: z.iso.datetime(),
  expired: z.boolean(),
});
export type PendingInvitation = z.infer<typeof pendingInvitationSchema>;

/** GET /api/rigs/:rigId/people */
export const peopleSchema = z.strictObject({ members: z.array(personSchema), invitations: z.array(pendingInvitationSchema) });
export type People = z.infer<typeof peopleSchema>;

/** POST /api/rigs/:rigId/invitations, and .../resend */
export const invitationSentSchema = z.strictObject({ id: z.string(), email: z.string(), role: z.string().nullable(), status: z.string(), expiresAt: z.iso.datetime() });
export type InvitationSent = z.infer<typeof invitationSentSchema>;

/** GET /api/invitations/:invitationId: the invitation as its invitee sees it. */
export const invitationViewSchema = z.strictObject({ id: z.string(), householdName: z.string(), inviterName: z.string().nullable(), role: z.string().nullable(), expiresAt: z.iso.datetime() });
export type InvitationView = z.infer<typeof invitationViewSchema>;
