// Sign-in with GitHub through passport-github2 (state and PKCE on). With no real OAuth app configured
// outside production, the same strategy talks to the local fake provider mounted at /fake-github.
import { Passport } from 'passport';
import { Strategy as GitHubStrategy, type Profile, type StrategyOptions } from 'passport-github2';
import type { Request } from 'express';
import type { Env } from '../../config/env';
import type { Logger } from '../../lib/logger';
import { identityFromProfile, isConfiguredAdmin } from './github-identity';
import { toSessionUser, type UsersRepository } from './users.repository';

export const callbackPath = '/auth/github/callback';
export const fakeGitHubPath = '/fake-github';
export const fakeClient = { clientId: 'railyard-local', clientSecret: 'railyard-local-secret' };

export interface OAuthEndpoints {
  clientId: string;
  clientSecret: string;
  authorizationURL: string;
  tokenURL: string;
  userProfileURL: string;
  userEmailURL: string;
}

export function createPassport(deps: {
  env: Env;
  users: UsersRepository;
  logger: Logger;
  /** endpoints for a request: fixed for GitHub, derived from the request's own origin for the fake */
  endpointsFor: (req: Request) => OAuthEndpoints;
}) {
  const { env, users, logger } = deps;
  const passport = new Passport();

  passport.serializeUser<number>((user, done) => done(null, user.id));
  // The user is read afresh on every request, so a role change or a ban applies at once.
  passport.deserializeUser<number>((id, done) => {
    users.findById(id).then(
      (row) => done(null, row ? { ...toSessionUser(row), banned: row.bannedAt !== null } : false),
      (err) => done(err),
    );
  });

  const strategies = new Map<string, GitHubStrategy>();
  function strategyFor(req: Request): GitHubStrategy {
    const endpoints = deps.endpointsFor(req);
    const key = JSON.stringify(endpoints);
    let strategy = strategies.get(key);
    if (!strategy) {
      strategy = new GitHubStrategy(
        {
          clientID: endpoints.clientId,
          clientSecret: endpoints.clientSecret,
          callbackURL: env.PUBLIC_URL ? new URL(callbackPath, env.PUBLIC_URL).toString() : callbackPath,
          authorizationURL: endpoints.authorizationURL,
          tokenURL: endpoints.tokenURL,
          userProfileURL: endpoints.userProfileURL,
          userEmailURL: endpoints.userEmailURL,
          scope: ['read:user', 'user:email'],
          state: true,
          pkce: true,
          allRawEmails: true,
        } as unknown as StrategyOptions, // @types/passport-github2 lags the library: no pkce, allRawEmails; state typed as string
        (_accessToken: string, _refreshToken: string, profile: Profile, done: (err: unknown, user?: Express.User | false) => void) => {
          let identity;
          try {
            identity = identityFromProfile(profile);
          } catch (err) {
            logger.warn({ err }, 'refused a GitHub profile');
            return done(null, false);
          }
          users.signIn(identity, isConfiguredAdmin(identity, env.RAILYARD_ADMINS)).then(
            (row) => done(null, { ...toSessionUser(row), banned: row.bannedAt !== null }),
            (err) => done(err),
          );
        },
      );
      strategies.set(key, strategy);
    }
    // passport binds its callbacks onto the instance it is given: one fresh object per request
    return Object.create(strategy) as GitHubStrategy;
  }

  return { passport, strategyFor };
}
