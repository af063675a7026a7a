import type { Request, RequestHandler, Response } from 'express';
import { can, type Action, type Role } from '../../shared/permissions';
import type { Database } from '../db/client';
import { membershipRole } from '../db/membership-role';
import { ForbiddenError, NotFoundError, UnauthorizedError } from './errors';

/** 401 unless signed in. */
export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new UnauthorizedError();
  next();
};

/** A restoration and the reader's role there, when the route can read both in one query. */
export type RestorationAndRole = { restorationId: number; role: Role | undefined };
/** Where the restoration id of a request comes from; by default the validated `:id` param. */
export type RestorationOf = (req: Request, res: Response) =>
  Promise<number | RestorationAndRole | undefined> | number | RestorationAndRole | undefined;
const fromIdParam: RestorationOf = (_req, res) => (res.locals.input as { params?: { id?: number } })?.params?.id;

/**
 * The one guard every restoration route goes through: signed in, a member (else a plain 404, never a
 * hint that it exists), and allowed by the policy (else 403). Puts `role` and `restorationId` on res.locals.
 */
export function guard(db: Database, action: Action, restorationOf: RestorationOf = fromIdParam): RequestHandler {
  return async (req, res, next) => {
    if (!req.user) throw new UnauthorizedError();
    const found = await restorationOf(req, res);
    const restorationId = typeof found === 'object' ? found.restorationId : found;
    const role = typeof found === 'object' ? found.role : restorationId ? await membershipRole(db, req.user.id, restorationId) : undefined;
    if (!restorationId || !role) throw new NotFoundError();
    if (!can(role, action)) throw new ForbiddenError();
    res.locals.role = role;
    res.locals.restorationId = restorationId;
    next();
  };
}

export const roleOf = (res: Response) => res.locals.role as Role;
