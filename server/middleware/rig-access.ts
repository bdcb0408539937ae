import type { NextFunction, Request, Response } from 'express';

import type { Db } from '@/db/client';
import { can, type Permission } from '@/shared/permissions';
import { rigIdParamsSchema } from '@/shared/schemas/rig';
import { HttpError } from '../errors';
import { findRigWithRole } from '../repositories/rigs';
import { session } from './session';

export type RigAccess = NonNullable<Awaited<ReturnType<typeof findRigWithRole>>>;

/**
 * The one permission check for everything under a rig: the caller's household role must allow the
 * permission. Someone outside the household gets 404, so rigs cannot be discovered; a household member
 * without the right gets 403.
 */
export function rigAccess(db: Db, permission: Permission) {
  return async (req: Request, res: Response, next: NextFunction) => {
    const params = rigIdParamsSchema.safeParse(req.params);
    const notFound = () => new HttpError(404, 'not_found', 'No such rig.');
    if (!params.success) return next(notFound());
    const access = await findRigWithRole(db, params.data.rigId, session(res).user.id);
    if (!access) return next(notFound());
    if (!can(access.role, permission)) return next(new HttpError(403, 'forbidden', `As ${access.role} of this rig you cannot do this.`));
    res.locals.rig = access;
    next();
  };
}

export const rigOf = (res: Response) => res.locals.rig as RigAccess;
