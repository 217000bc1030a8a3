// createApp(): middleware, routers and the error handler. No listen() here, so tests can mount it.
import { existsSync } from 'node:fs';
import path from 'node:path';
import compression from 'compression';
import express, { type Request } from 'express';
import { pinoHttp } from 'pino-http';
import type pg from 'pg';
import { usesFakeGitHub, type Env } from './config/env';
import { createDatabase } from './db/client';
import { createFakeGitHub } from './dev/fake-github/fake-github';
import { demoAccounts } from './dev/fake-github/demo-accounts';
import type { Logger } from './lib/logger';
import { csrfGuard } from './middleware/csrf-guard';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { createRateLimit } from './middleware/rate-limit';
import { securityHeaders } from './middleware/security-headers';
import { adminRouter } from './modules/admin/admin.routes';
import { createAuditRepository } from './modules/audit/audit.repository';
import { refuseBanned, sessionApiRouter, signInRouter } from './modules/auth/auth.routes';
import { callbackPath, createPassport, fakeClient, fakeGitHubPath, type OAuthEndpoints } from './modules/auth/passport-setup';
import { absoluteSessionExpiry, createSessionMiddleware, sessionCookieName } from './modules/auth/session';
import { createUsersRepository } from './modules/auth/users.repository';
import { boardEditsRouter } from './modules/board-edits/board-edits.routes';
import { createBoardEditsRepository } from './modules/board-edits/board-edits.repository';
import { createBoardEditsService } from './modules/board-edits/board-edits.service';
import { createBoardsRepository } from './modules/boards/boards.repository';
import { boardsRouter } from './modules/boards/boards.routes';
import { createBoardsService } from './modules/boards/boards.service';
import { attachmentsRouter } from './modules/attachments/attachments.routes';
import { createAttachmentsRepository } from './modules/attachments/attachments.repository';
import { createAttachmentsService } from './modules/attachments/attachments.service';
import { createLocalDiskStorage } from './modules/attachments/attachment-storage';
import { createCasebookRepository } from './modules/casebook/casebook.repository';
import { casebookRouter, mergedCasePagesRouter } from './modules/casebook/casebook.routes';
import { createCasebookService } from './modules/casebook/casebook.service';
import { createImportsRepository } from './modules/imports/imports.repository';
import { importsRouter } from './modules/imports/imports.routes';
import { createImportsService } from './modules/imports/imports.service';
import { mailboxRouter } from './dev/mail-catcher/mailbox.routes';
import { createNotificationDelivery } from './modules/notifications/notification-delivery';
import { createNotificationsRepository } from './modules/notifications/notifications.repository';
import { notificationsRouter } from './modules/notifications/notifications.routes';
import { createNotificationsService } from './modules/notifications/notifications.service';
import { createPowerGraphCache } from './modules/power-tree/power-graph-cache';
import { createPowerTreeRepository } from './modules/power-tree/power-tree.repository';
import { powerTreeRouter } from './modules/power-tree/power-tree.routes';
import { createPowerTreeService } from './modules/power-tree/power-tree.service';
import { createSearchRepository } from './modules/search/search.repository';
import { searchRouter } from './modules/search/search.routes';
import { createSearchService } from './modules/search/search.service';

export interface AppDeps {
  env: Env;
  pool: pg.Pool;
  logger: Logger;
}

export function createServices({ env, pool, logger }: AppDeps) {
  const db = createDatabase(pool);
  const boardsRepository = createBoardsRepository(db);
  const graphCache = createPowerGraphCache({ pool, repo: createPowerTreeRepository(db), logger });
  return {
    boards: createBoardsService(boardsRepository),
    imports: createImportsService({
      pool,
      jobs: createImportsRepository(db),
      logger,
      boardChanged: (boardId) => graphCache.drop(boardId),
    }),
    powerTree: createPowerTreeService({ boards: boardsRepository, cache: graphCache }),
    search: createSearchService(createSearchRepository(db)),
    boardEdits: createBoardEditsService({
      boards: boardsRepository,
      edits: createBoardEditsRepository(db),
      boardChanged: (boardId) => graphCache.drop(boardId),
    }),
    casebook: createCasebookService({ boards: boardsRepository, cases: createCasebookRepository(db) }),
    attachments: createAttachmentsService({
      repo: createAttachmentsRepository(db),
      storage: createLocalDiskStorage(env.ATTACHMENTS_DIR),
      logger,
    }),
    notifications: createNotificationsService({ repo: createNotificationsRepository(db) }),
    users: createUsersRepository(db),
    audit: createAuditRepository(db),
    /** releases what the services hold open (the cache's LISTEN connection) */
    close: () => graphCache.close(),
  };
}

/** The power-tree trace routes (power-tree.routes.ts), which send their own gzipped bytes. */
const tracePath = /^\/api\/boards\/[^/]+\/(?:nets\/[^/]+\/)?tree$/;

function requestOrigin(req: Request): string {
  return `${req.protocol}://${req.get('host')}`;
}

export function createApp({ env, pool, logger }: AppDeps) {
  const services = createServices({ env, pool, logger });
  // e-mail: the outbox worker, and outside production without SMTP_URL the local mail catcher
  const delivery = createNotificationDelivery({ env, db: createDatabase(pool), logger });
  void delivery.start().catch((err) => logger.error({ err }, 'notification delivery did not start'));
  const production = env.NODE_ENV === 'production';
  const app = express();
  app.disable('x-powered-by');
  app.set('query parser', 'simple');
  if (env.TRUST_PROXY) app.set('trust proxy', /^\d+$/.test(env.TRUST_PROXY) ? Number(env.TRUST_PROXY) : env.TRUST_PROXY);

  app.use(securityHeaders({ staticDir: env.STATIC_DIR, production, imageHosts: production ? ['https://avatars.githubusercontent.com'] : [] }));
  // gzip for clients that ask, on text answers over 1 KB (the client's scripts, board lists, placements).
  // Power-tree traces come gzipped from their cache and skip the middleware: wrapping the response costs
  // the most read route about a quarter of its requests per second even when nothing is compressed.
  const gzip = compression({ threshold: 1024 });
  app.use((req, res, next) => (tracePath.test(req.path) ? next() : gzip(req, res, next)));
  // One log line per request only when asked for (LOG_LEVEL=debug or trace). Otherwise handlers log through
  // the app's logger itself: pino-http's per-request child logger and serialisers cost more than a
  // small cached response.
  if (env.LOG_LEVEL === 'debug' || env.LOG_LEVEL === 'trace') {
    app.use(pinoHttp({ logger }));
  } else {
    app.use((req, _res, next) => {
      req.log = logger;
      next();
    });
  }

  // Sign-in: real GitHub, or outside production without credentials the local fake at /fake-github.
  const fake = usesFakeGitHub(env)
    ? createFakeGitHub({
        clients: [{ ...fakeClient, redirectUris: [] }],
        accounts: [...demoAccounts],
        // any loopback origin this server answers on may receive codes
        isAllowedRedirect: (uri: string) => new URL(uri).pathname === callbackPath,
      })
    : null;
  if (fake) app.use(fakeGitHubPath, fake.router);
  const endpointsFor = (req: Request): OAuthEndpoints =>
    fake
      ? {
          ...fakeClient,
          authorizationURL: `${requestOrigin(req)}${fakeGitHubPath}/login/oauth/authorize`,
          tokenURL: `${requestOrigin(req)}${fakeGitHubPath}/login/oauth/access_token`,
          userProfileURL: `${requestOrigin(req)}${fakeGitHubPath}/user`,
          userEmailURL: `${requestOrigin(req)}${fakeGitHubPath}/user/emails`,
        }
      : {
          clientId: env.GITHUB_CLIENT_ID!,
          clientSecret: env.GITHUB_CLIENT_SECRET!,
          authorizationURL: env.GITHUB_AUTHORIZE_URL,
          tokenURL: env.GITHUB_TOKEN_URL,
          userProfileURL: env.GITHUB_USER_URL,
          userEmailURL: env.GITHUB_EMAILS_URL,
        };
  const { passport, strategyFor } = createPassport({ env, users: services.users, logger, endpointsFor });

  const withSession = express.Router();
  withSession.use(createSessionMiddleware(env, pool), absoluteSessionExpiry(env), passport.session(), refuseBanned);
  const cookieName = sessionCookieName(env);
  // A read without a session cookie has nobody to find: it skips the session store and passport.
  // Sign-in (/auth) always gets a session, since it starts one.
  app.use((req, res, next) => {
    const read = req.method === 'GET' || req.method === 'HEAD';
    const hasSessionCookie = (req.headers.cookie ?? '').split(';').some((c) => c.trim().startsWith(`${cookieName}=`));
    if (read && !hasSessionCookie && !req.path.startsWith('/auth/')) return next();
    withSession(req, res, next);
  });

  const minute = 60_000;
  const limits = {
    signIn: createRateLimit(pool, 'sign-in', env.RATE_SIGNIN_PER_15_MIN, 15 * minute),
    writes: createRateLimit(pool, 'writes', env.RATE_WRITES_PER_MIN, minute),
    uploads: createRateLimit(pool, 'uploads', env.RATE_UPLOADS_PER_HOUR, 60 * minute),
  };
  app.use(signInRouter({ passport, strategyFor, signInLimit: limits.signIn }));

  const publicOrigin = env.PUBLIC_URL ? new URL(env.PUBLIC_URL).origin : null;
  const api = express.Router();
  api.use(csrfGuard({ isAllowedOrigin: (origin, req) => origin === (publicOrigin ?? requestOrigin(req)) }));
  // reads carry no body: they skip the JSON parser
  const jsonBody = express.json({ limit: '1mb' });
  api.use((req, res, next) => (req.method === 'GET' || req.method === 'HEAD' ? next() : jsonBody(req, res, next)));
  // liveness: the process answers, without touching the database
  api.get('/health/live', (_req, res) => {
    res.json({ status: 'ok' });
  });
  // readiness: the database answers too
  api.get('/health', async (_req, res) => {
    await pool.query('SELECT 1');
    res.json({ status: 'ok' });
  });
  // the most read routes first: every router before a route is walked for each request
  api.use(powerTreeRouter(services.powerTree));
  api.use(sessionApiRouter({ cookieName: sessionCookieName(env) }));
  api.use(boardsRouter(services.boards));
  api.use(importsRouter(services.imports, { maxBytes: env.IMPORT_MAX_BYTES, uploadLimit: limits.uploads }));
  api.use(searchRouter(services.search));
  api.use(boardEditsRouter(services.boardEdits, limits.writes));
  api.use(casebookRouter(services.casebook, limits.writes));
  api.use(
    attachmentsRouter(services.attachments, {
      maxBytes: env.ATTACHMENT_MAX_BYTES,
      maxFiles: env.ATTACHMENT_MAX_FILES,
      uploadLimit: limits.uploads,
      writeLimit: limits.writes,
    }),
  );
  api.use(notificationsRouter(services.notifications, limits.writes));
  if (delivery.catcher) api.use(mailboxRouter(delivery.catcher));
  api.use(adminRouter({ users: services.users, audit: services.audit, casebook: services.casebook, writeLimit: limits.writes }));
  api.use(notFoundHandler);
  app.use('/api', api);

  if (env.STATIC_DIR && existsSync(env.STATIC_DIR)) {
    const root = path.resolve(env.STATIC_DIR);
    app.use(express.static(root, { index: false, maxAge: '1h' }));
    app.use(mergedCasePagesRouter(services.casebook));
    // client-side routes: every other GET gets the app shell
    app.get(/^(?!\/api\/).*/, (_req, res) => {
      res.sendFile(path.join(root, 'index.html'));
    });
  }

  app.use(errorHandler(logger));
  const shutdown = async () => {
    await delivery.stop();
    await services.close();
  };
  return Object.assign(app, { shutdown, fakeGitHub: fake, limits, notifications: delivery });
}
