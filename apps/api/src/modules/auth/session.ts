// Sessions in PostgreSQL (connect-pg-simple on the app's pool). Cookie: httpOnly, SameSite=Lax; in
// production also Secure with the __Host- prefix (no Domain, Path=/). Idle expiry rolls with each
// request; the absolute limit is enforced from the sign-in time kept in the session.
import { randomBytes } from 'node:crypto';
import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { RequestHandler } from 'express';
import type pg from 'pg';
import type { Env } from '../../config/env';

declare module 'express-session' {
  interface SessionData {
    signedInAt?: number;
    returnTo?: string;
  }
}

export function sessionCookieName(env: Env): string {
  return env.NODE_ENV === 'production' ? '__Host-railyard.sid' : 'railyard.sid';
}

export function createSessionMiddleware(env: Env, pool: pg.Pool): RequestHandler {
  const PgStore = connectPgSimple(session);
  const production = env.NODE_ENV === 'production';
  return session({
    name: sessionCookieName(env),
    store: new PgStore({ pool, tableName: 'user_sessions', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    // outside production a per-process secret: sessions end when the server restarts
    secret: env.SESSION_SECRET ?? randomBytes(32).toString('hex'),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: env.TRUST_PROXY !== '' ? true : undefined,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: production,
      path: '/',
      maxAge: env.SESSION_IDLE_HOURS * 3600_000,
    },
  });
}

/** Ends sessions older than SESSION_MAX_HOURS since sign-in, whatever their activity. */
export function absoluteSessionExpiry(env: Env): RequestHandler {
  const maxMs = env.SESSION_MAX_HOURS * 3600_000;
  return (req, _res, next) => {
    const signedInAt = req.session?.signedInAt;
    if (signedInAt === undefined || Date.now() - signedInAt <= maxMs) return next();
    req.session.destroy(() => {
      // the request goes on signed out
      (req as { user?: unknown }).user = undefined;
      next();
    });
  };
}
