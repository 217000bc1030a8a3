// Role checks. Every state-changing route carries one of these guards; the authorization-matrix test
// walks the app's routes and fails on any mutating route without one.
import type { RequestHandler } from 'express';
import { roleAtLeast, type SessionUser, type UserRole } from '@railyard/shared';
import { AppError } from '../lib/app-error';

export type Access = 'public' | UserRole;

export type GuardHandler = RequestHandler & { access: Access };

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport's req.user is this shape (set by deserializeUser)
    interface User extends SessionUser {
      banned: boolean;
    }
  }
}

export function requireRole(role: UserRole): GuardHandler {
  const guard: RequestHandler = (req, _res, next) => {
    const user = req.user;
    if (!user) {
      next(new AppError(401, 'sign_in_required', 'Sign in to do this'));
      return;
    }
    if (!roleAtLeast(user.role, role)) {
      next(new AppError(403, 'forbidden', `This needs the ${role} role`));
      return;
    }
    next();
  };
  return Object.assign(guard, { access: role });
}

/** Marks a state-changing route that anyone may call (sign-out, for one); still CSRF-checked. */
export function allowAnyone(): GuardHandler {
  const open: RequestHandler = (_req, _res, next) => next();
  return Object.assign(open, { access: 'public' as const });
}
