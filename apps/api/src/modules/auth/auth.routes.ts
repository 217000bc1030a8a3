import { Router, type RequestHandler } from 'express';
import type { PassportStatic } from 'passport';
import type { Request } from 'express';
import type { Strategy } from 'passport-github2';
import { z } from 'zod';
import { AppError } from '../../lib/app-error';
import { allowAnyone } from '../../middleware/require-role';
import { callbackPath } from './passport-setup';

// Only a path on this site may follow a sign-in, never another origin.
const returnToSchema = z
  .string()
  .regex(/^\/(?!\/)[^\s\\]*$/)
  .max(500)
  .catch('/');

// passport-oauth2's error classes for what the provider refused; GitHub answers a refused code with
// status 200 and an error body, which passport-oauth2 reports as a plain "Failed to obtain access token"
const oauthErrorNames = new Set(['TokenError', 'AuthorizationError', 'InternalOAuthError']);
function isRefusedByProvider(err: unknown): boolean {
  if (!(err instanceof Error)) return false;
  return oauthErrorNames.has(err.name) || err.message.startsWith('Failed to obtain access token');
}

/** GET /auth/github and its callback: browser navigations, not API calls. */
export function signInRouter(deps: {
  passport: InstanceType<typeof import('passport').Passport> | PassportStatic;
  strategyFor: (req: Request) => Strategy;
  signInLimit: RequestHandler;
}): Router {
  const { passport, strategyFor, signInLimit } = deps;
  const router = Router();

  router.get('/auth/github', signInLimit, (req, res, next) => {
    req.session.returnTo = returnToSchema.parse(req.query.returnTo ?? '/');
    passport.authenticate(strategyFor(req), { session: true })(req, res, next);
  });

  router.get(callbackPath, signInLimit, (req, res, next) => {
    passport.authenticate(strategyFor(req), { keepSessionInfo: true }, (err: unknown, user: Express.User | false) => {
      // a refused code exchange (bad code, PKCE mismatch, provider error) is a failed sign-in, not a fault
      if (err && isRefusedByProvider(err)) {
        req.log?.warn({ err }, 'sign-in refused by the OAuth provider');
        return res.redirect(303, '/?signin=failed');
      }
      if (err) return next(err);
      if (!user) return res.redirect(303, '/?signin=failed');
      if (user.banned) return res.redirect(303, '/?signin=banned');
      const returnTo = req.session.returnTo ?? '/';
      // passport regenerates the session id here (session fixation: OWASP ASVS 5.0 V7.2.4)
      req.logIn(user, { session: true, keepSessionInfo: false }, (loginErr) => {
        if (loginErr) return next(loginErr);
        req.session.signedInAt = Date.now();
        res.redirect(303, returnTo);
      });
    })(req, res, next);
  });

  return router;
}

/** /api/me and /api/auth/logout. */
export function sessionApiRouter(deps: { cookieName: string }): Router {
  const router = Router();

  router.get('/me', (req, res) => {
    const user = req.user;
    res.json({ user: user ? { id: user.id, login: user.login, name: user.name, avatarUrl: user.avatarUrl, role: user.role } : null });
  });

  router.post('/auth/logout', allowAnyone(), (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie(deps.cookieName, { path: '/' });
        res.status(204).end();
      });
    });
  });

  return router;
}

/** After deserialisation: a banned account's session ends and the request is refused. */
export const refuseBanned: RequestHandler = (req, _res, next) => {
  if (!req.user?.banned) return next();
  req.logout(() => {
    req.session.destroy(() => next(new AppError(403, 'banned', 'This account is banned')));
  });
};
