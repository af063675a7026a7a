import type { Request, RequestHandler, Response } from 'express';
import { can, type Action, type PolicyContext, type Role } from '../../shared/permissions';
import type { Database } from '../db/client';
import { membershipRole } from '../db/membership-role';
import { ForbiddenError, NotFoundError, UnauthorizedError } from './errors';
import { validate, type Schemas } from './validate';

/** 401 unless signed in. */
export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new UnauthorizedError();
  next();
};

/**
 * The row a route acts on, for rules that depend on it. `view` says who may know the row exists at all (else 404,
 * as for a stranger): an action judged with `context`, or, where the visibility rule is applied in SQL, a query for
 * the caller's role. `context` holds the facts the rules read (shared with the owner, the caller wrote it).
 */
export interface Subject {
  view: Action | ((role: Role) => Promise<boolean>);
  context?: PolicyContext;
  /** The words of the 403 when the rule says no (e.g. "Only a technician deletes a finding someone else placed."). */
  denied?: string;
}
/**
 * A restoration, and the reader's role there when the route can read both in one query (else the guard looks it
 * up), and the row acted on when the route's permission depends on it.
 */
export type RestorationAndRole = { restorationId: number; role?: Role | undefined; subject?: Subject };
/** Where the restoration id of a request comes from; by default the validated `:id` param. */
export type RestorationOf = (
  req: Request,
  res: Response,
) => Promise<number | RestorationAndRole | undefined> | number | RestorationAndRole | undefined;
const fromIdParam: RestorationOf = (_req, res) => (res.locals.input as { params?: { id?: number } })?.params?.id;

/**
 * The one guard every restoration route goes through: signed in, a member (else a plain 404, never a
 * hint that it exists), allowed to see the row acted on if any (else 404 too), and allowed by the policy, with the
 * row's facts as context (else 403). Puts `role` and `restorationId` on res.locals.
 */
export function guard(db: Database, action: Action, restorationOf: RestorationOf = fromIdParam): RequestHandler {
  return async (req, res, next) => {
    if (!req.user) throw new UnauthorizedError();
    const found = await restorationOf(req, res);
    const restorationId = typeof found === 'object' ? found.restorationId : found;
    const role =
      typeof found === 'object' && 'role' in found
        ? found.role
        : restorationId
          ? await membershipRole(db, req.user.id, restorationId)
          : undefined;
    if (!restorationId || !role) throw new NotFoundError();
    const subject = typeof found === 'object' ? found.subject : undefined;
    if (
      subject &&
      !(typeof subject.view === 'function' ? await subject.view(role) : can(role, subject.view, subject.context))
    )
      throw new NotFoundError();
    if (!can(role, action, subject?.context)) throw new ForbiddenError(subject?.denied);
    res.locals.role = role;
    res.locals.restorationId = restorationId;
    next();
  };
}

export const roleOf = (res: Response) => res.locals.role as Role;

/**
 * What a restoration route runs before its handler, in this order: signed in (401), its input validated (400), then
 * the guard for its action (404 for a stranger or a row they may not see, 403 when the policy says no).
 */
export const guarded = (
  db: Database,
  schemas: Schemas,
  action: Action,
  restorationOf?: RestorationOf,
): RequestHandler[] => [requireUser, validate(schemas), guard(db, action, restorationOf)];
