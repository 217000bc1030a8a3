// createApp(): middleware, routers and the error handler. No listen() here, so tests can mount it.
import { existsSync } from 'node:fs';
import path from 'node:path';
import express from 'express';
import { pinoHttp } from 'pino-http';
import type pg from 'pg';
import type { Env } from './config/env';
import { createDatabase } from './db/client';
import type { Logger } from './lib/logger';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { createBoardsRepository } from './modules/boards/boards.repository';
import { boardsRouter } from './modules/boards/boards.routes';
import { createBoardsService } from './modules/boards/boards.service';
import { createImportsRepository } from './modules/imports/imports.repository';
import { importsRouter } from './modules/imports/imports.routes';
import { createImportsService } from './modules/imports/imports.service';
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

export function createServices({ pool, logger }: Pick<AppDeps, 'pool' | 'logger'>) {
  const db = createDatabase(pool);
  const boardsRepository = createBoardsRepository(db);
  const graphCache = createPowerGraphCache({ pool, repo: createPowerTreeRepository(db), logger });
  return {
    boards: createBoardsService(boardsRepository),
    imports: createImportsService({ pool, jobs: createImportsRepository(db), logger }),
    powerTree: createPowerTreeService({ boards: boardsRepository, cache: graphCache }),
    search: createSearchService(createSearchRepository(db)),
    /** releases what the services hold open (the cache's LISTEN connection) */
    close: () => graphCache.close(),
  };
}

export function createApp({ env, pool, logger }: AppDeps) {
  const services = createServices({ pool, logger });
  const app = express();
  app.disable('x-powered-by');
  app.set('query parser', 'simple');
  // one log line per request only when asked for (LOG_LEVEL=debug or trace)
  app.use(pinoHttp({ logger, autoLogging: env.LOG_LEVEL === 'debug' || env.LOG_LEVEL === 'trace' }));

  const api = express.Router();
  api.use(express.json({ limit: '1mb' }));
  // liveness: the process answers, without touching the database
  api.get('/health/live', (_req, res) => {
    res.json({ status: 'ok' });
  });
  // readiness: the database answers too
  api.get('/health', async (_req, res) => {
    await pool.query('SELECT 1');
    res.json({ status: 'ok' });
  });
  api.use(boardsRouter(services.boards));
  api.use(importsRouter(services.imports, { maxBytes: env.IMPORT_MAX_BYTES }));
  api.use(powerTreeRouter(services.powerTree));
  api.use(searchRouter(services.search));
  api.use(notFoundHandler);
  app.use('/api', api);

  if (env.STATIC_DIR && existsSync(env.STATIC_DIR)) {
    const root = path.resolve(env.STATIC_DIR);
    app.use(express.static(root, { index: false, maxAge: '1h' }));
    // client-side routes: every other GET gets the app shell
    app.get(/^(?!\/api\/).*/, (_req, res) => {
      res.sendFile(path.join(root, 'index.html'));
    });
  }

  app.use(errorHandler(logger));
  return Object.assign(app, { shutdown: services.close });
}
