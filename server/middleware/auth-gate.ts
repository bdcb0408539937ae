import type { NextFunction, Request, Response } from 'express';
import { z } from 'zod';

import { HttpError, issuesToFields } from '../errors';

const id = z.string().min(1).max(64);
const count = (max: number) => z.coerce.number().int().min(0).max(max);
const filterValue = z.union([z.string().max(200), z.array(z.string().max(200)).max(50)]);

/** better-auth's list queries pass sortBy and filterField to the database unchecked (an unknown column is a 500): only these. */
const listMembersQuery = z.strictObject({
  organizationId: id.optional(),
  organizationSlug: z.string().max(100).optional(),
  limit: count(200).optional(),
  offset: count(100_000).optional(),
  sortBy: z.enum(['createdAt', 'role']).optional(),
  sortDirection: z.enum(['asc', 'desc']).optional(),
  filterField: z.enum(['role', 'userId']).optional(),
  filterOperator: z.enum(['eq', 'ne', 'in', 'not_in']).optional(),
  filterValue: filterValue.optional(),
});
const listUsersQuery = z.strictObject({
  searchValue: z.string().max(200).optional(),
  searchField: z.enum(['email', 'name']).optional(),
  searchOperator: z.enum(['contains', 'starts_with', 'ends_with']).optional(),
  limit: count(200).optional(),
  offset: count(100_000).optional(),
  sortBy: z.enum(['createdAt', 'name', 'email', 'role']).optional(),
  sortDirection: z.enum(['asc', 'desc']).optional(),
  filterField: z.enum(['role', 'email', 'name']).optional(),
  filterOperator: z.enum(['eq', 'ne', 'in', 'not_in']).optional(),
  filterValue: filterValue.optional(),
});
const noQuery = z.strictObject({});

/**
 * What better-auth's admin and organization plugins may be asked over HTTP (method, path, query).
 * An admin lists accounts and sets their roles, nothing more (no impersonation, sessions, passwords,
 * bans or account edits). Households are read here but changed only through Keyoff's own routes under
 * /api/rigs/:rigId, which check the household's rules and write the rig's History.
 */
const OPEN: Record<string, { method: string; query: z.ZodType }> = {
  '/admin/list-users': { method: 'GET', query: listUsersQuery },
  '/admin/set-role': { method: 'POST', query: noQuery },
  '/organization/list': { method: 'GET', query: noQuery },
  '/organization/get-full-organization': { method: 'GET', query: z.strictObject({ organizationId: id.optional(), organizationSlug: z.string().max(100).optional(), membersLimit: count(200).optional() }) },
  '/organization/list-members': { method: 'GET', query: listMembersQuery },
  '/organization/get-active-member': { method: 'GET', query: noQuery },
  '/organization/get-active-member-role': { method: 'GET', query: z.strictObject({ userId: id.optional(), organizationId: id.optional(), organizationSlug: z.string().max(100).optional() }) },
  '/organization/list-invitations': { method: 'GET', query: z.strictObject({ organizationId: id.optional() }) },
  '/organization/get-invitation': { method: 'GET', query: z.strictObject({ id }) },
  '/organization/list-user-invitations': { method: 'GET', query: noQuery },
};

/** In front of better-auth's handler: refuses what this app does not offer and checks list queries (400 naming the parameter). */
export function authGate(req: Request, _res: Response, next: NextFunction) {
  const path = (req.path.replace(/^\/api\/auth/, '') || '/').replace(/\/+$/, '');
  if (!path.startsWith('/admin/') && !path.startsWith('/organization/')) return next();
  const rule = OPEN[path];
  if (!rule || (req.method !== rule.method && !(rule.method === 'GET' && req.method === 'HEAD'))) {
    const message = path.startsWith('/admin/')
      ? 'An admin lists accounts and sets their roles; nothing else is offered.'
      : 'Households change through Keyoff: use the People routes of the rig (/api/rigs/:rigId/...).';
    return next(new HttpError(403, 'forbidden', message));
  }
  const query = rule.query.safeParse(req.query);
  if (!query.success) return next(new HttpError(400, 'validation_failed', 'Some query parameters are not valid.', issuesToFields(query.error)));
  next();
}
