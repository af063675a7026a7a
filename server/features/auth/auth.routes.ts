import { Router, type Request } from 'express';
import type { createPassport } from './passport';
import {
  confirmEmailSchema,
  passwordResetConfirmSchema,
  passwordResetRequestSchema,
  signInSchema,
  signUpSchema,
  type SignUpResult,
  type Session,
  type User,
} from '../../../shared/schemas/auth';
import type { AppDeps } from '../../app-deps';
import { HttpError, UnauthorizedError } from '../../http/errors';
import { requireUser } from '../../http/guard';
import { input, validate } from '../../http/validate';
import { invitationsService } from '../invitations/invitations.service';
import { authService } from './auth.service';
import { REMEMBER_MS, SESSION_COOKIE } from './session';
import { createThrottles } from './throttle';

const signUp = { body: signUpSchema };
const signIn = { body: signInSchema };
const resetRequest = { body: passwordResetRequestSchema };
const resetConfirm = { body: passwordResetConfirmSchema };
const confirm = { body: confirmEmailSchema };

/** Passport's login regenerates the session id, so a session fixed before sign-in is worthless. */
const login = (req: Request, user: User, remember = false) =>
  new Promise<void>((resolve, reject) =>
    req.login(user, (err) => {
      if (err) return reject(err);
      if (remember) req.session.cookie.maxAge = REMEMBER_MS;
      resolve();
    }),
  );

export function authRoutes(deps: AppDeps, passport: ReturnType<typeof createPassport>): Router {
  const auth = authService(deps);
  const invitations = invitationsService(deps);
  const throttles = createThrottles(deps.pool, deps.config.throttle);
  const router = Router();

  router.post('/auth/sign-up', validate(signUp), async (req, res) => {
    const { invitationToken, ...fields } = input(res, signUp).body;
    await throttles.signUpAttempt(req.ip ?? 'unknown', fields.email.toLowerCase());
    if (invitationToken) await invitations.assertInvitedAddress(invitationToken, fields.email);
    // From an invitation, the account and the membership are created together (or neither); sign-in follows the commit.
    const created = await auth.signUp(
      fields,
      invitationToken ? (tx, user) => invitations.acceptIn(tx, invitationToken, user) : undefined,
    );
    if (!created) return void res.status(202).json({ status: 'check-email' } satisfies SignUpResult);
    await login(req, created.user);
    res.status(201).json({
      status: 'signed-in',
      user: created.user,
      restorationId: created.joined?.restorationId,
    } satisfies SignUpResult);
  });

  router.post('/auth/confirm-email', validate(confirm), async (req, res) => {
    const user = await auth.confirmEmail(input(res, confirm).body.token);
    await login(req, user);
    res.json(user);
  });

  router.post('/auth/sign-in', validate(signIn), async (req, res, next) => {
    const { email, remember } = input(res, signIn).body;
    const ip = req.ip ?? 'unknown';
    const account = email.toLowerCase();
    await throttles.signInAttempt(ip, account);
    const user = await new Promise<User | false>((resolve, reject) =>
      passport.authenticate('local', { session: false }, (err: unknown, u: User | false) =>
        err ? reject(err) : resolve(u),
      )(req, res, next),
    );
    if (!user) throw new UnauthorizedError('That e-mail and password do not match an account.');
    await throttles.signInSucceeded(ip, account);
    if (!(await auth.isConfirmed(user.id)))
      throw new HttpError(
        403,
        'email_unconfirmed',
        'Confirm your e-mail address first: follow the link we sent you. Sign up again with the same address to get a new link.',
      );
    await login(req, user, remember);
    res.json(user);
  });

  router.post('/auth/sign-out', (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy(() => {
        res.clearCookie(SESSION_COOKIE);
        res.status(204).end();
      });
    });
  });

  router.get('/auth/me', requireUser, (req, res) => {
    res.json(req.user);
  });

  // The page's "who is signed in?" check: being signed out is an answer here (200), not an error.
  router.get('/auth/session', (req, res) => {
    res.json({ user: req.user ?? null } satisfies Session);
  });

  router.post('/auth/password-reset', validate(resetRequest), async (req, res) => {
    const { email } = input(res, resetRequest).body;
    await throttles.resetRequested(req.ip ?? 'unknown', email.toLowerCase());
    // Not awaited: the answer takes the same time whether or not the address has an account.
    auth.requestReset(email).catch((err) => req.log.error({ err }, 'password reset e-mail failed'));
    res.status(202).json({ message: 'If that address has an account, a reset link is on its way.' });
  });

  router.post('/auth/password-reset/confirm', validate(resetConfirm), async (req, res) => {
    const { token, password } = input(res, resetConfirm).body;
    const user = await auth.confirmReset(token, password);
    await login(req, user);
    res.json(user);
  });
  return router;
}
