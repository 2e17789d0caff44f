import type { Request, Response } from 'express';
import type { PassportInstance as Passport } from '../auth/passport.js';
import { z } from 'zod';
import { changePasswordBody, csrfTokenResponse, loginBody, loginResponse, meResponse, passwordResetCompleteBody, passwordResetRequestBody } from '../../shared/schemas/auth.js';
import type { SignInLimits } from '../auth/rate-limits.js';
import type { ApiRouter } from '../http/api-router.js';
import { anyone, signedIn } from '../http/access.js';
import { ApiError } from '../http/errors.js';
import { actorOf } from '../services/audit.service.js';
import type { AuthService } from '../services/auth.service.js';
import type { PasswordService } from '../services/password.service.js';

export interface AuthRouteDeps {
  auth: AuthService;
  passwords: PasswordService;
  passport: Passport;
  limits: SignInLimits;
  generateCsrfToken: (req: Request, res: Response, overwrite?: boolean) => string;
}

const message = z.object({ message: z.string() }).meta({ id: 'Message' });

function authenticate(passport: Passport, req: Request, res: Response): Promise<Express.User | null> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', { session: false }, (err: unknown, user: Express.User | false) => {
      if (err) reject(err);
      else resolve(user || null);
    })(req, res, reject);
  });
}

export function authRoutes(api: ApiRouter, deps: AuthRouteDeps) {
  const tag = 'Sign-in';

  api.route({
    method: 'get',
    path: '/auth/csrf',
    tag,
    summary: 'A CSRF token for this session, to send in the x-csrf-token header of every change',
    access: anyone,
    response: csrfTokenResponse,
    before: [deps.limits.csrfTokens],
    errors: [429],
    handler: ({ req, res }) => ({ csrfToken: deps.generateCsrfToken(req, res) }),
  });

  api.route({
    method: 'post',
    path: '/auth/login',
    tag,
    summary: 'Sign in with e-mail and password',
    access: anyone,
    body: loginBody,
    response: loginResponse,
    errors: [429],
    before: [deps.limits.perAddress, deps.limits.perAccountFromAddress, deps.limits.perAccount],
    handler: async ({ req, res, body }) => {
      const user = await authenticate(deps.passport, req, res);
      if (!user) {
        await deps.auth.recordFailedSignIn(body.email, actorOf(req));
        throw new ApiError(401, 'unauthenticated', 'The e-mail address or the password is not correct.');
      }
      await new Promise<void>((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
      req.session.signedInAt = Date.now();
      const csrfToken = deps.generateCsrfToken(req, res, true);
      await deps.auth.recordSignIn(user, actorOf(req));
      return { ...deps.auth.me(user, req.session.cookie.expires ?? undefined), csrfToken };
    },
  });

  api.route({
    method: 'post',
    path: '/auth/logout',
    tag,
    summary: 'Sign out and end this session',
    access: anyone,
    status: 204,
    handler: async ({ req }) => {
      const user = req.user;
      if (user) await deps.auth.recordSignOut(user, actorOf(req));
      await new Promise<void>((resolve, reject) => req.logOut((err) => (err ? reject(err) : resolve())));
      await new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
    },
  });

  api.route({
    method: 'get',
    path: '/auth/me',
    tag,
    summary: 'The signed-in user, their role and what they may do',
    access: signedIn,
    response: meResponse,
    handler: ({ req }) => deps.auth.me(req.user!, req.session.cookie.expires ?? undefined),
  });

  api.route({
    method: 'post',
    path: '/auth/password',
    tag,
    summary: 'Change your own password (ends your other sessions)',
    access: signedIn,
    body: changePasswordBody,
    status: 204,
    errors: [429],
    before: [deps.limits.passwordChange],
    handler: async ({ req, body }) => {
      await deps.passwords.change(req.user!.id, body, req.sessionID, actorOf(req));
    },
  });

  api.route({
    method: 'post',
    path: '/auth/password-reset',
    tag,
    summary: 'Send a password reset link (the answer is the same whether or not the account exists)',
    access: anyone,
    body: passwordResetRequestBody,
    status: 202,
    response: message,
    errors: [429],
    before: [deps.limits.resetRequests],
    handler: async ({ req, body }) => {
      await deps.passwords.requestReset(body.email, actorOf(req));
      return { message: 'If an active account uses this address, a reset link is on its way. Check your e-mail.' };
    },
  });

  api.route({
    method: 'post',
    path: '/auth/password-reset/complete',
    tag,
    summary: 'Choose a new password with the token from a reset link',
    access: anyone,
    body: passwordResetCompleteBody,
    status: 204,
    errors: [422],
    handler: async ({ req, body }) => {
      await deps.passwords.completeReset(body, req.ip ?? null);
    },
  });
}
