// API tests run the real Express app, listening on an ephemeral loopback port, against the real
// PostgreSQL database that `npm test` started and migrated (DATABASE_URL). Sign-in goes through the
// real passport-github2 strategy and the local fake GitHub mounted by the app.
import { randomBytes, randomInt } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import pg from 'pg';
import request from 'supertest';
import type { UserRole } from '@railyard/shared';
import { createApp } from '../../apps/api/src/app';
import { readEnv, type Env } from '../../apps/api/src/config/env';
import { createHttpServer } from '../../apps/api/src/lib/http-server';
import { createLogger } from '../../apps/api/src/lib/logger';

export function testEnv(overrides: Partial<Env> = {}): Env {
  const env = readEnv({ ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'silent', STATIC_DIR: '' });
  // every test signs in and writes from 127.0.0.1: limits high unless a test asks for its own
  const unlimited = { RATE_SIGNIN_PER_15_MIN: 1_000_000, RATE_WRITES_PER_MIN: 1_000_000, RATE_UPLOADS_PER_HOUR: 1_000_000 };
  // the outbox worker runs only when a test drives it, so tests do not send each other's mail
  const quiet = { NOTIFY_INTERVAL_SECONDS: 0 };
  return { ...env, ...unlimited, ...quiet, ...overrides };
}

type RailyardApp = ReturnType<typeof createApp>;
type Agent = ReturnType<typeof request.agent>;

export interface TestUser {
  id: number;
  githubId: number;
  login: string;
  role: UserRole;
}

export interface TestApp {
  app: RailyardApp;
  pool: pg.Pool;
  env: Env;
  baseUrl: string;
  server: Server;
  agent(): Agent;
  agentAs(role: UserRole): Promise<Agent & { user: TestUser }>;
  close(): Promise<void>;
}

export async function createTestApp(overrides: Partial<Env> = {}): Promise<TestApp> {
  const env = testEnv(overrides);
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
  const app = createApp({ env, pool, logger: createLogger('silent') });
  const server = await new Promise<Server>((resolve) => {
    const s = createHttpServer(app).listen(0, '127.0.0.1', () => resolve(s));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const test: TestApp = {
    app,
    pool,
    env,
    baseUrl,
    server,
    /** a cookie-keeping client that sends this site's Origin, as a browser does on same-origin writes */
    agent: () => request.agent(baseUrl).set('Origin', baseUrl),
    /** a signed-in client of a fresh account with the given role */
    async agentAs(role: UserRole) {
      const user = await createUser(test, role);
      const agent = test.agent();
      await signIn(test, agent, user.login);
      return Object.assign(agent, { user });
    },
    close: async () => {
      await new Promise((r) => server.close(r));
      await app.shutdown();
      await pool.end();
    },
  };
  return test;
}

/** A new person known to the fake GitHub and to Railyard with the given role. */
export async function createUser(test: Pick<TestApp, 'app' | 'pool'>, role: UserRole): Promise<TestUser> {
  const githubId = randomInt(100_000_000, 2_000_000_000);
  const login = `tech-${randomBytes(4).toString('hex')}`;
  test.app.fakeGitHub!.accounts.add({
    id: githubId,
    login,
    name: `Test ${role}`,
    emails: [{ email: `${login}@example.com`, primary: true, verified: true, visibility: 'private' }],
  });
  const { rows } = await test.pool.query<{ id: number }>(
    'INSERT INTO users (github_id, login, name, role) VALUES ($1, $2, $3, $4) RETURNING id',
    [githubId, login, `Test ${role}`, role],
  );
  return { id: rows[0]!.id, githubId, login, role };
}

function pathOf(location: string): string {
  const url = new URL(location, 'http://placeholder');
  return url.pathname + url.search;
}

/** Signs in through the whole OAuth code flow: our redirect, the fake's page and decision, our callback. */
export async function signIn(test: Pick<TestApp, 'app'>, agent: Agent, login: string, returnTo = '/') {
  const start = await agent.get(`/auth/github?returnTo=${encodeURIComponent(returnTo)}`).redirects(0);
  if (start.status !== 302) throw new Error(`sign-in did not redirect: ${start.status}`);
  const page = await agent.get(pathOf(start.headers.location!));
  const requestId = /name="request_id" value="([^"]+)"/.exec(page.text)?.[1];
  const account = test.app.fakeGitHub!.accounts.findByLogin(login);
  if (!requestId || !account) throw new Error(`no sign-in page or no fake account for ${login}`);
  const decision = await agent
    .post('/fake-github/login/oauth/authorize')
    .type('form')
    .send({ request_id: requestId, account_id: String(account.id) })
    .redirects(0);
  const callback = await agent.get(pathOf(decision.headers.location!)).redirects(0);
  if (callback.status !== 303 || callback.headers.location !== returnTo) {
    throw new Error(`sign-in failed: ${callback.status} → ${callback.headers.location}`);
  }
  return callback;
}

/** A slug no other test uses, so each test owns its rows. */
export function uniqueSlug(prefix = 'test'): string {
  return `${prefix}-${randomBytes(4).toString('hex')}`;
}

/** Row counts of every netlist table for one board (by slug), to prove a failed import changed nothing. */
export async function boardRowCounts(pool: pg.Pool, slug: string) {
  const { rows } = await pool.query<Record<string, number>>(
    `SELECT
       (SELECT count(*) FROM boards WHERE slug = $1)::int AS boards,
       (SELECT count(*) FROM nets n JOIN boards b ON b.id = n.board_id WHERE b.slug = $1)::int AS nets,
       (SELECT count(*) FROM net_aliases a JOIN boards b ON b.id = a.board_id WHERE b.slug = $1)::int AS aliases,
       (SELECT count(*) FROM components c JOIN boards b ON b.id = c.board_id WHERE b.slug = $1)::int AS components,
       (SELECT count(*) FROM pins p JOIN boards b ON b.id = p.board_id WHERE b.slug = $1)::int AS pins,
       (SELECT count(*) FROM power_links l JOIN boards b ON b.id = l.board_id WHERE b.slug = $1)::int AS links`,
    [slug],
  );
  return rows[0]!;
}
