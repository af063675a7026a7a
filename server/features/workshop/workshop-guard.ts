import type { RequestHandler } from 'express';
import { can, workshopRole, type Action } from '../../../shared/permissions';
import type { Database } from '../../db/client';
import { ForbiddenError, UnauthorizedError } from '../../http/errors';
import { rolesHeld, workshopAdminsRepo } from './workshop.repo';

export const NOT_AN_ADMIN = "Only the workshop's administrators change its settings: ask one of them.";

/**
 * The guard for workshop-wide routes: signed in (else 401), and allowed by the policy for the person's workshop
 * role, taken from the roles they hold on restorations (else 403: the settings' existence is no secret). With
 * `admin`, the person must also be one of the workshop's administrators (decision 46): anyone may sign up and take
 * in a set, so a technician's role alone does not reach the workshop's own prices.
 */
export function workshopGuard(db: Database, action: Action, { admin = false } = {}): RequestHandler {
  return async (req, res, next) => {
    if (!req.user) throw new UnauthorizedError();
    const role = workshopRole(await rolesHeld(db, req.user.id));
    if (!can(role, action)) throw new ForbiddenError();
    if (admin && !(await workshopAdminsRepo(db).isAdmin(req.user.id))) throw new ForbiddenError(NOT_AN_ADMIN);
    res.locals.role = role;
    next();
  };
}
