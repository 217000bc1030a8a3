// A local stand-in for GitHub's OAuth web flow and the two REST calls a sign-in makes, speaking
// GitHub's paths and answers so passport-github2 talks to it unchanged. Development and tests only.
//
// Sources for the behaviour: GitHub's docs "Authorizing OAuth apps", "Troubleshooting authorization
// request errors" and "Troubleshooting OAuth app access token request errors"; RFC 6749 (OAuth 2.0)
// and RFC 7636 (PKCE) where GitHub's docs say nothing.
import { randomBytes, randomInt, timingSafeEqual } from 'node:crypto';
import express, { Router, type NextFunction, type Request, type Response } from 'express';
import { demoAccounts } from './demo-accounts';
import {
  assertValidAccount,
  cloneAccount,
  emailsJson,
  isValidGitHubLogin,
  loginRuleText,
  userJson,
  type FakeGitHubAccount,
} from './github-account';
import { isWellFormedPkceValue, verifierMatchesChallenge, type PkceMethod } from './pkce';
import {
  renderErrorPage,
  renderProfilePage,
  renderSignInPage,
  signInStylesheet,
  stylesheetPath,
} from './sign-in-page';

export type { FakeGitHubAccount, FakeGitHubEmail } from './github-account';

export interface FakeGitHubClient {
  clientId: string;
  clientSecret: string;
  /** exact URLs; the first is used when an authorization request names none (as GitHub does) */
  redirectUris: string[];
}

export interface FakeGitHubOptions {
  clients: FakeGitHubClient[];
  /** defaults to the demo accounts */
  accounts?: readonly FakeGitHubAccount[];
  /**
   * Accepts redirect URIs beyond each client's list, for a server whose own origin is known only
   * per request (any loopback port). An authorization request must then name its redirect_uri
   * when the client lists none.
   */
  isAllowedRedirect?: (redirectUri: string, clientId: string) => boolean;
  /** milliseconds since the epoch; tests move it to expire codes */
  now?: () => number;
  /**
   * RFC 7636 §4.2 also defines the "plain" method, but GitHub accepts only S256 (GitHub changelog,
   * 2025-07-14, "PKCE support for OAuth and GitHub App authentication"), so plain is refused
   * unless this is set.
   */
  allowPlainPkce?: boolean;
  /**
   * GitHub refuses a token to a user whose primary e-mail is unverified (`unverified_user_email`).
   * Off by default so the demo account with an unverified primary address can sign in and
   * Railyard's own handling of unverified addresses can be exercised.
   */
  refuseUnverifiedPrimaryEmail?: boolean;
}

export type FakeGitHubEndpoint =
  'authorize' | 'authorize-decision' | 'access_token' | 'user' | 'user/emails';

export interface FakeGitHubCall {
  endpoint: FakeGitHubEndpoint;
  at: number;
  /** the request's parameters; a client_secret is recorded as "[redacted]" */
  params: Record<string, string>;
  /** "ok", "redirected" or the error code answered */
  outcome: string;
  accountId?: number;
}

export interface FakeAccountStore {
  /** copies, in the order they were added */
  list(): FakeGitHubAccount[];
  get(id: number): FakeGitHubAccount | undefined;
  /** GitHub logins compare without regard to case */
  findByLogin(login: string): FakeGitHubAccount | undefined;
  /** throws when the account is malformed or its id or login is taken */
  add(account: FakeGitHubAccount): FakeGitHubAccount;
  /** invalidates every access token and every outstanding authorization code */
  revokeAll(): void;
  /** tokens handed out since the fake was created, revoked ones included */
  issuedTokenCount(): number;
  /** requests to the OAuth and API endpoints, oldest first (the latest 1,000 are kept) */
  readonly calls: readonly FakeGitHubCall[];
}

// GitHub's docs: "The temporary code will expire after 10 minutes."
const codeLifetimeMs = 10 * 60 * 1000;
// the sign-in page waits as long as a code would
const pendingLifetimeMs = codeLifetimeMs;
// spent codes are remembered a while so a replay can still revoke what they issued
const spentCodeMemoryMs = 24 * 60 * 60 * 1000;
const maxLoggedCalls = 1000;
// ids of accounts typed on the sign-in page start above the demo range
const firstCreatedAccountId = 920001;

const docs = {
  authorizeErrors:
    'https://docs.github.com/apps/oauth-apps/maintaining-oauth-apps/troubleshooting-authorization-request-errors',
  tokenErrors:
    'https://docs.github.com/apps/oauth-apps/maintaining-oauth-apps/troubleshooting-oauth-app-access-token-request-errors',
  rest: 'https://docs.github.com/rest',
  getUser: 'https://docs.github.com/rest/users/users#get-the-authenticated-user',
  listEmails:
    'https://docs.github.com/rest/users/emails#list-email-addresses-for-the-authenticated-user',
};

interface PkceBinding {
  challenge: string;
  method: PkceMethod;
}

interface PendingAuthorization {
  clientId: string;
  redirectUri: string;
  scopes: string[];
  state: string | undefined;
  pkce: PkceBinding | undefined;
  expiresAt: number;
}

interface AuthorizationCode {
  clientId: string;
  redirectUri: string;
  accountId: number;
  scopes: string[];
  pkce: PkceBinding | undefined;
  expiresAt: number;
  spent: boolean;
  tokens: string[];
}

interface AccessToken {
  accountId: number;
  clientId: string;
  scopes: string[];
}

type ParamSource = { values: Record<string, string>; malformed: string[] };

/** Parameters given once each; repeated or structured ones are listed as malformed (RFC 6749 §3.1). */
function readParams(entries: Iterable<[string, unknown]>): ParamSource {
  const values: Record<string, string> = Object.create(null);
  const malformed: string[] = [];
  for (const [key, value] of entries) {
    if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') {
      if (key in values) malformed.push(key);
      else values[key] = String(value);
    } else if (value !== undefined && value !== null) {
      malformed.push(key);
    }
  }
  return { values, malformed };
}

function queryParams(req: Request): ParamSource {
  // read the raw query so the host app's "query parser" setting cannot change what is seen
  return readParams(new URL(req.originalUrl, 'http://fake.invalid').searchParams.entries());
}

function bodyParams(req: Request): ParamSource {
  const body: unknown = req.body;
  return readParams(body && typeof body === 'object' ? Object.entries(body) : []);
}

function redacted(params: Record<string, string>): Record<string, string> {
  const copy = { ...params };
  if ('client_secret' in copy) copy.client_secret = '[redacted]';
  return copy;
}

function parseScopes(raw: string | undefined): string[] {
  // GitHub documents a space-delimited list; passport-github2 joins with commas. Both are read.
  return [...new Set((raw ?? '').split(/[\s,]+/).filter(Boolean))];
}

function sameSecret(given: string, expected: string): boolean {
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}

const base62 = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

function newAccessToken(): string {
  // the shape of GitHub's OAuth tokens: "gho_" and 36 letters or digits
  let token = 'gho_';
  for (let i = 0; i < 36; i += 1) token += base62[randomInt(base62.length)];
  return token;
}

function withParams(base: string, params: Record<string, string | undefined>): string {
  const url = new URL(base);
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined) url.searchParams.append(key, value);
  }
  return url.toString();
}

function originOf(url: string): string {
  return new URL(url).origin;
}

function sendPage(res: Response, status: number, html: string, formTarget?: string) {
  const formAction = formTarget ? `'self' ${originOf(formTarget)}` : "'none'";
  res
    .status(status)
    .set({
      'Content-Security-Policy': `default-src 'none'; style-src 'self'; img-src data:; form-action ${formAction}; frame-ancestors 'none'; base-uri 'none'`,
      'Cache-Control': 'no-store',
      'Referrer-Policy': 'no-referrer',
      'X-Content-Type-Options': 'nosniff',
    })
    .type('html')
    .send(html);
}

function notFoundJson(res: Response) {
  res.status(404).json({ message: 'Not Found', documentation_url: docs.rest });
}

export function createFakeGitHub(options: FakeGitHubOptions): {
  router: Router;
  accounts: FakeAccountStore;
} {
  const now = options.now ?? Date.now;
  const allowedPkceMethods: PkceMethod[] = options.allowPlainPkce ? ['S256', 'plain'] : ['S256'];

  const clients = new Map<string, FakeGitHubClient>();
  for (const client of options.clients) {
    if (!client.clientId || !client.clientSecret) {
      throw new TypeError('fake GitHub client: clientId and clientSecret must not be empty');
    }
    if (client.redirectUris.length === 0 && !options.isAllowedRedirect) {
      throw new TypeError(
        `fake GitHub client ${client.clientId}: register at least one redirect URI`,
      );
    }
    client.redirectUris.forEach((uri, index) => {
      if (!URL.canParse(uri)) {
        throw new TypeError(
          `fake GitHub client ${client.clientId}: redirectUris[${index}] is not an absolute URL: ${uri}`,
        );
      }
    });
    clients.set(client.clientId, { ...client, redirectUris: [...client.redirectUris] });
  }

  const accountsById = new Map<number, FakeGitHubAccount>();
  const pending = new Map<string, PendingAuthorization>();
  const codes = new Map<string, AuthorizationCode>();
  const tokens = new Map<string, AccessToken>();
  const calls: FakeGitHubCall[] = [];
  let tokensIssued = 0;

  const store: FakeAccountStore = {
    list: () => [...accountsById.values()].map(cloneAccount),
    get: (id) => {
      const account = accountsById.get(id);
      return account && cloneAccount(account);
    },
    findByLogin: (login) => {
      const wanted = login.toLowerCase();
      const account = [...accountsById.values()].find((a) => a.login.toLowerCase() === wanted);
      return account && cloneAccount(account);
    },
    add: (account) => {
      assertValidAccount(account);
      if (accountsById.has(account.id)) {
        throw new TypeError(
          `fake GitHub account ${account.login}: id ${account.id} is already taken`,
        );
      }
      if (store.findByLogin(account.login)) {
        throw new TypeError(
          `fake GitHub account ${account.id}: login ${account.login} is already taken`,
        );
      }
      const stored = cloneAccount(account);
      accountsById.set(stored.id, stored);
      return cloneAccount(stored);
    },
    revokeAll: () => {
      tokens.clear();
      codes.clear();
      pending.clear();
    },
    issuedTokenCount: () => tokensIssued,
    calls,
  };

  for (const account of options.accounts ?? demoAccounts) store.add(account);

  function record(call: Omit<FakeGitHubCall, 'at'>) {
    calls.push({ ...call, params: redacted(call.params), at: now() });
    // a long `npm start` session should not grow the log without bound
    if (calls.length > maxLoggedCalls) calls.splice(0, calls.length - maxLoggedCalls);
  }

  function prune() {
    const t = now();
    for (const [id, entry] of pending) if (entry.expiresAt <= t) pending.delete(id);
    for (const [code, entry] of codes)
      if (entry.expiresAt + spentCodeMemoryMs <= t) codes.delete(code);
  }

  function createAccount(login: string): FakeGitHubAccount {
    const highest = Math.max(firstCreatedAccountId - 1, ...accountsById.keys());
    return store.add({
      id: highest + 1,
      login,
      name: null,
      description: 'Created on the sign-in page',
      emails: [
        {
          email: `${login.toLowerCase()}@example.com`,
          primary: true,
          verified: true,
          visibility: 'private',
        },
      ],
    });
  }

  function isRegisteredRedirect(client: FakeGitHubClient, uri: string): boolean {
    if (client.redirectUris.includes(uri)) return true;
    return URL.canParse(uri) && (options.isAllowedRedirect?.(uri, client.clientId) ?? false);
  }

  const router = Router();

  router.get(stylesheetPath, (_req, res) => {
    res.type('text/css').set('Cache-Control', 'public, max-age=300').send(signInStylesheet);
  });

  // ---- GET /login/oauth/authorize: validate, then let the person choose an account ----------
  router.get('/login/oauth/authorize', (req, res) => {
    const { values: q, malformed } = queryParams(req);
    const base = req.baseUrl;
    const refusePage = (outcome: string, title: string, message: string) => {
      record({ endpoint: 'authorize', params: q, outcome });
      sendPage(res, 400, renderErrorPage(base, title, message));
    };

    if (malformed.length > 0) {
      return refusePage(
        'invalid_request',
        'bad request',
        `Give each parameter once: ${malformed.join(', ')}.`,
      );
    }
    const client = q.client_id === undefined ? undefined : clients.get(q.client_id);
    if (!client) {
      return refusePage(
        'unknown_client',
        'unknown application',
        q.client_id === undefined
          ? 'The request has no client_id.'
          : `No application is registered with client_id "${q.client_id}".`,
      );
    }
    // RFC 6749 §4.1.2.1: with a bad redirect URI the person is told, never redirected there.
    // (GitHub's docs describe redirecting to the registered callback instead; a page is safer.)
    const redirectUri = q.redirect_uri ?? client.redirectUris[0];
    if (redirectUri === undefined) {
      return refusePage(
        'redirect_uri_mismatch',
        'redirect URI missing',
        `Application "${client.clientId}" registers no default callback URL: the request must name its redirect_uri.`,
      );
    }
    if (!isRegisteredRedirect(client, redirectUri)) {
      return refusePage(
        'redirect_uri_mismatch',
        'redirect URI not registered',
        `The redirect_uri "${redirectUri}" is not registered for application "${client.clientId}".` +
          (client.redirectUris.length > 0 ? ` Registered: ${client.redirectUris.join(', ')}.` : ''),
      );
    }

    // from here the client and its redirect are trusted: errors go back to it (RFC 6749 §4.1.2.1)
    const refuseToClient = (error: string, description: string) => {
      record({ endpoint: 'authorize', params: q, outcome: error });
      res.redirect(
        302,
        withParams(redirectUri, {
          error,
          error_description: description,
          error_uri: docs.authorizeErrors,
          state: q.state,
        }),
      );
    };
    if (q.response_type !== undefined && q.response_type !== 'code') {
      return refuseToClient('unsupported_response_type', 'Only response_type=code is supported.');
    }
    let pkce: PkceBinding | undefined;
    if (q.code_challenge !== undefined || q.code_challenge_method !== undefined) {
      // RFC 7636 §4.3: a missing method means "plain"
      const method = q.code_challenge_method ?? 'plain';
      if (!allowedPkceMethods.includes(method as PkceMethod)) {
        return refuseToClient(
          'invalid_request',
          `code_challenge_method must be ${allowedPkceMethods.join(' or ')}, got "${method}".`,
        );
      }
      const challenge = q.code_challenge ?? '';
      // an S256 challenge is base64url of 32 bytes: 43 characters (RFC 7636 §4.2)
      if (!isWellFormedPkceValue(challenge) || (method === 'S256' && challenge.length !== 43)) {
        return refuseToClient(
          'invalid_request',
          'code_challenge must be 43 to 128 characters of A-Z a-z 0-9 - . _ ~ (43 for S256).',
        );
      }
      pkce = { challenge, method: method as PkceMethod };
    }

    prune();
    const requestId = randomBytes(16).toString('hex');
    const scopes = parseScopes(q.scope);
    pending.set(requestId, {
      clientId: client.clientId,
      redirectUri,
      scopes,
      state: q.state,
      pkce,
      expiresAt: now() + pendingLifetimeMs,
    });
    record({ endpoint: 'authorize', params: q, outcome: 'ok' });
    sendPage(
      res,
      200,
      renderSignInPage({
        baseUrl: base,
        requestId,
        clientId: client.clientId,
        redirectUri,
        scopes,
        accounts: store.list(),
      }),
      redirectUri,
    );
  });

  // ---- POST /login/oauth/authorize: the person chose an account or cancelled -----------------
  router.post(
    '/login/oauth/authorize',
    express.urlencoded({ extended: false, limit: '16kb' }),
    (req, res) => {
      const { values: form } = bodyParams(req);
      const base = req.baseUrl;
      const requestId = form.request_id ?? '';
      const request = pending.get(requestId);
      if (!request || request.expiresAt <= now()) {
        pending.delete(requestId);
        record({ endpoint: 'authorize-decision', params: form, outcome: 'expired_request' });
        return sendPage(
          res,
          400,
          renderErrorPage(
            base,
            'sign-in page expired',
            'This sign-in page was already used or is more than 10 minutes old.',
          ),
        );
      }
      const finish = (
        params: Record<string, string | undefined>,
        outcome: string,
        accountId?: number,
      ) => {
        pending.delete(requestId);
        record({ endpoint: 'authorize-decision', params: form, outcome, accountId });
        // state goes back exactly as it came, and not at all when none came
        res.redirect(302, withParams(request.redirectUri, { ...params, state: request.state }));
      };
      const showAgain = (loginError: string, loginValue?: string) => {
        record({ endpoint: 'authorize-decision', params: form, outcome: 'invalid_choice' });
        sendPage(
          res,
          400,
          renderSignInPage({
            baseUrl: base,
            requestId,
            clientId: request.clientId,
            redirectUri: request.redirectUri,
            scopes: request.scopes,
            accounts: store.list(),
            loginError,
            loginValue,
          }),
          request.redirectUri,
        );
      };

      if (form.decision === 'cancel') {
        // the parameters GitHub documents under "Access denied"
        return finish(
          {
            error: 'access_denied',
            error_description: 'The user has denied your application access.',
            error_uri: `${docs.authorizeErrors}#access-denied`,
          },
          'access_denied',
        );
      }

      let account: FakeGitHubAccount | undefined;
      if (form.account_id !== undefined) {
        account = /^\d+$/.test(form.account_id) ? store.get(Number(form.account_id)) : undefined;
        if (!account) return showAgain(`There is no account with id ${form.account_id}.`);
      } else if (form.login !== undefined && form.login.trim() !== '') {
        const login = form.login.trim();
        if (!isValidGitHubLogin(login)) {
          return showAgain(`"${login}" is not a GitHub login: use ${loginRuleText}.`, login);
        }
        account = store.findByLogin(login) ?? createAccount(login);
      } else {
        return showAgain('Choose one of the accounts or type a login.');
      }

      prune();
      const code = randomBytes(10).toString('hex');
      codes.set(code, {
        clientId: request.clientId,
        redirectUri: request.redirectUri,
        accountId: account.id,
        scopes: request.scopes,
        pkce: request.pkce,
        expiresAt: now() + codeLifetimeMs,
        spent: false,
        tokens: [],
      });
      finish({ code }, 'redirected', account.id);
    },
  );

  // ---- POST /login/oauth/access_token: code for token -----------------------------------------
  router.post(
    '/login/oauth/access_token',
    express.urlencoded({ extended: false, limit: '16kb' }),
    express.json({ limit: '16kb' }),
    (req, res) => {
      const query = queryParams(req);
      const body = bodyParams(req);
      const p = { ...query.values, ...body.values };
      const malformed = [...query.malformed, ...body.malformed];

      // GitHub answers JSON when asked, form-encoded otherwise; errors too, and with status 200
      const answer = (fields: Record<string, string>, outcome: string, accountId?: number) => {
        record({ endpoint: 'access_token', params: p, outcome, accountId });
        // RFC 6749 §5.1: token responses must not be cached
        res.status(200).set({ 'Cache-Control': 'no-store', Pragma: 'no-cache' });
        if (
          req.accepts(['application/x-www-form-urlencoded', 'application/json']) ===
          'application/json'
        ) {
          res.json(fields);
        } else {
          res
            .type('application/x-www-form-urlencoded')
            .send(new URLSearchParams(fields).toString());
        }
      };
      const refuse = (error: string, description: string, anchor?: string) =>
        answer(
          {
            error,
            error_description: description,
            error_uri: anchor ? `${docs.tokenErrors}#${anchor}` : docs.tokenErrors,
          },
          error,
        );
      const badCode = (description: string) =>
        refuse('bad_verification_code', description, 'bad-verification-code');

      if (malformed.length > 0) {
        return refuse('invalid_request', `Give each parameter once: ${malformed.join(', ')}.`, '');
      }
      if (p.grant_type !== undefined && p.grant_type !== 'authorization_code') {
        return refuse(
          'unsupported_grant_type',
          `The fake provider supports grant_type=authorization_code only, got "${p.grant_type}".`,
        );
      }
      const client = p.client_id === undefined ? undefined : clients.get(p.client_id);
      if (
        !client ||
        p.client_secret === undefined ||
        !sameSecret(p.client_secret, client.clientSecret)
      ) {
        return refuse(
          'incorrect_client_credentials',
          'The client_id and/or client_secret passed are incorrect.',
          'incorrect-client-credentials',
        );
      }
      const grant = p.code === undefined ? undefined : codes.get(p.code);
      if (!grant || grant.clientId !== client.clientId) {
        return badCode('The code passed is incorrect or expired.');
      }
      if (grant.spent) {
        // RFC 6749 §4.1.2: a code used twice is refused, and what it issued is revoked
        for (const token of grant.tokens) tokens.delete(token);
        return badCode('The code passed was already used; the token issued from it is revoked.');
      }
      // the first exchange that names the code with the right credentials spends it, even if refused
      grant.spent = true;
      if (now() >= grant.expiresAt) {
        return badCode('The code passed is incorrect or expired.');
      }
      if (p.redirect_uri !== undefined && p.redirect_uri !== grant.redirectUri) {
        return refuse(
          'redirect_uri_mismatch',
          'The redirect_uri MUST match the registered callback URL for this application.',
          'redirect-uri-mismatch',
        );
      }
      if (grant.pkce) {
        if (p.code_verifier === undefined) {
          return badCode('The code was issued with a code_challenge; code_verifier is missing.');
        }
        if (!verifierMatchesChallenge(p.code_verifier, grant.pkce.challenge, grant.pkce.method)) {
          return badCode('The code_verifier does not match the code_challenge.');
        }
      } else if (p.code_verifier !== undefined) {
        // RFC 9700 §4.8 (PKCE downgrade): a verifier for a code issued without a challenge is refused
        return badCode(
          'The code was issued without a code_challenge; code_verifier is not expected.',
        );
      }
      const account = accountsById.get(grant.accountId);
      if (!account) return badCode('The account behind this code no longer exists.');
      if (
        options.refuseUnverifiedPrimaryEmail &&
        !account.emails.find((e) => e.primary)?.verified
      ) {
        return refuse(
          'unverified_user_email',
          'The user must have a verified primary email.',
          'unverified_user_email',
        );
      }

      const accessToken = newAccessToken();
      tokens.set(accessToken, {
        accountId: account.id,
        clientId: client.clientId,
        scopes: grant.scopes,
      });
      grant.tokens.push(accessToken);
      tokensIssued += 1;
      answer(
        { access_token: accessToken, scope: grant.scopes.join(','), token_type: 'bearer' },
        'ok',
        account.id,
      );
    },
  );

  // ---- the REST API part: always JSON ---------------------------------------------------------
  function authenticated(req: Request, res: Response, endpoint: FakeGitHubEndpoint) {
    const header = req.get('authorization');
    const match = header?.match(/^(?:token|bearer)\s+(\S+)\s*$/i);
    if (!match) {
      record({ endpoint, params: {}, outcome: 'requires_authentication' });
      res.status(401).json({ message: 'Requires authentication', documentation_url: docs.getUser });
      return undefined;
    }
    const grant = tokens.get(match[1]!);
    const account = grant && accountsById.get(grant.accountId);
    if (!grant || !account) {
      record({ endpoint, params: {}, outcome: 'bad_credentials' });
      res.status(401).json({ message: 'Bad credentials', documentation_url: docs.rest });
      return undefined;
    }
    // GitHub lists a token's scopes on every API answer
    res.set('X-OAuth-Scopes', grant.scopes.join(', '));
    return { grant, account };
  }

  function htmlBase(req: Request): string {
    return `${req.protocol}://${req.get('host')}${req.baseUrl}`;
  }

  router.get('/user', (req, res) => {
    const auth = authenticated(req, res, 'user');
    if (!auth) return;
    record({ endpoint: 'user', params: {}, outcome: 'ok', accountId: auth.account.id });
    res.json(userJson(auth.account, htmlBase(req)));
  });

  router.get('/user/emails', (req, res) => {
    const auth = authenticated(req, res, 'user/emails');
    if (!auth) return;
    // GitHub's docs: listing addresses needs the user:email scope (user includes it). The 404 for
    // a token without it is GitHub's usual answer for a resource out of scope (from memory).
    if (!auth.grant.scopes.some((scope) => scope === 'user' || scope === 'user:email')) {
      record({
        endpoint: 'user/emails',
        params: {},
        outcome: 'not_found',
        accountId: auth.account.id,
      });
      res.status(404).json({ message: 'Not Found', documentation_url: docs.listEmails });
      return;
    }
    record({ endpoint: 'user/emails', params: {}, outcome: 'ok', accountId: auth.account.id });
    res.json(emailsJson(auth.account));
  });

  // html_url of an account: a small profile page instead of a link to the real github.com
  router.get('/:login', (req, res, next) => {
    const account = store.findByLogin(String(req.params.login));
    if (!account) return next();
    sendPage(res, 200, renderProfilePage(req.baseUrl, account));
  });

  router.use((_req, res) => notFoundJson(res));

  router.use((err: unknown, req: Request, res: Response, _next: NextFunction) => {
    const status = (err as { status?: unknown })?.status;
    const type = (err as { type?: unknown })?.type;
    if (type === 'entity.parse.failed') {
      res.status(400).json({ message: 'Problems parsing JSON', documentation_url: docs.rest });
    } else if (typeof status === 'number' && status >= 400 && status < 500) {
      res
        .status(status)
        .json({ message: String((err as Error).message), documentation_url: docs.rest });
    } else {
      console.error('fake GitHub: unexpected error on', req.method, req.originalUrl, err);
      res.status(500).json({ message: 'Server Error', documentation_url: docs.rest });
    }
  });

  return { router, accounts: store };
}
