import * as admin from '@/shared/api/admin';
import * as me from '@/shared/api/me';
import * as people from '@/shared/api/people';
import * as rigs from '@/shared/api/rigs';
import { ADMIN, type Endpoint, json, noContent, SIGNED_IN } from './registry';

/** The signed-in account's own routes, the invitee's side of an invitation, and the admin's. */
export const ACCOUNT_ENDPOINTS: Endpoint[] = [
  {
    method: 'get',
    path: '/api/me',
    tag: 'account',
    summary: 'Who is signed in, with their account role, households and energy unit.',
    who: SIGNED_IN,
    responses: { 200: json('The account.', me.meSchema) },
  },
  {
    method: 'put',
    path: '/api/me/units',
    tag: 'account',
    summary: 'Keeps the caller’s energy unit (Ah or Wh) on the account: the e-mails state their figures in it.',
    who: SIGNED_IN,
    body: me.unitsSchema,
    responses: { 200: json('The unit as kept.', me.savedUnitsSchema) },
  },
  {
    method: 'get',
    path: '/api/me/email-prefs',
    tag: 'account',
    summary: 'The caller’s e-mail preferences (weekdays from Monday = 0).',
    who: SIGNED_IN,
    responses: { 200: json('The preferences; `saved` false while they are the defaults.', me.savedEmailPrefsSchema) },
  },
  {
    method: 'put',
    path: '/api/me/email-prefs',
    tag: 'account',
    summary: 'Saves the caller’s e-mail preferences.',
    who: SIGNED_IN,
    body: me.emailPrefsSchema,
    responses: { 200: json('The preferences as saved.', me.savedEmailPrefsSchema) },
  },
  {
    method: 'get',
    path: '/api/clients',
    tag: 'rigs',
    summary: 'The rigs the caller advises, Short first, then Tight, then Comfortable, with unread notes.',
    who: SIGNED_IN,
    responses: { 200: json('The clients.', rigs.clientListSchema) },
  },
  {
    method: 'get',
    path: '/api/invitations/{invitationId}',
    tag: 'people',
    summary: 'An invitation as its invitee sees it: only to the address it was sent to, only once, only in time.',
    who: 'the invitee (the account with the address it was sent to)',
    params: people.invitationIdParamsSchema,
    responses: { 200: json('The invitation.', people.invitationViewSchema) },
    errors: { 403: 'Sent to another address.', 404: 'No such invitation.', 409: 'Used or withdrawn already.', 410: 'Expired.' },
  },
  {
    method: 'post',
    path: '/api/invitations/{invitationId}/accept',
    tag: 'people',
    summary: 'Accepts an invitation: the caller joins the household in the role it names.',
    who: 'the invitee (the account with the address it was sent to)',
    params: people.invitationIdParamsSchema,
    responses: { 204: noContent('Joined.') },
    errors: { 403: 'Sent to another address.', 404: 'No such invitation.', 409: 'Used or withdrawn already.', 410: 'Expired.' },
  },
  {
    method: 'get',
    path: '/api/admin/users',
    tag: 'admin',
    summary: 'Accounts and their roles (an admin sees accounts, never a budget they were not invited to).',
    who: ADMIN,
    responses: { 200: json('Up to 200 accounts, oldest first.', admin.accountListSchema) },
  },
  {
    method: 'put',
    path: '/api/admin/users/{userId}/role',
    tag: 'admin',
    summary: 'Sets an account’s role.',
    who: ADMIN,
    params: admin.userParamsSchema,
    body: admin.accountRoleBodySchema,
    responses: { 204: noContent('Set; the account’s sessions pick it up on their next request.') },
  },
  {
    method: 'get',
    path: '/api/admin/email-failures',
    tag: 'admin',
    summary: 'E-mails whose last attempt failed, with the error and the attempts (no budget figures).',
    who: ADMIN,
    responses: { 200: json('The failures.', admin.emailFailureListSchema) },
  },
];
