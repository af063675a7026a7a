import type { RequestHandler } from 'express';
import { can, workshopRole, type Action } from '../../../shared/permissions';
import type { Database } from '../../db/client';
import { ForbiddenError, UnauthorizedError } from '../../http/errors';
import { rolesHeld } from './workshop.repo';

/**
 * The guard for workshop-wide routes: signed in (else 401), and allowed by the policy for the person's workshop
 * role, taken from the roles they hold on restorations (else 403: the settings' existence is no secret).
 */
export function workshopGuard(db: Database, action: Action): RequestHandler {
  return async (req, res, next) => {
    if (!req.user) throw new UnauthorizedError();
    const role = workshopRole(await rolesHeld(db, req.user.id));
    if (!can(role, action)) throw new ForbiddenError();
    res.locals.role = role;
    next();
  };
}
