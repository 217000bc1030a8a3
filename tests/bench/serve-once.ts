// The API as its own process for HTTP benchmarks, so the load generator does not share its event loop.
// Runs as in production (NODE_ENV=production: Express's production paths, no fake sign-in). Nothing
// signs in during a benchmark, so the sign-in settings production insists on get stand-in values
// unless the caller passes real ones. Prints "listening <port>" once ready.
import { randomBytes } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../apps/api/src/app';
import { readEnv } from '../../apps/api/src/config/env';
import { createPool } from '../../apps/api/src/db/client';
import { createHttpServer } from '../../apps/api/src/lib/http-server';
import { createLogger } from '../../apps/api/src/lib/logger';

const env = readEnv({
  GITHUB_CLIENT_ID: 'bench-client',
  GITHUB_CLIENT_SECRET: 'bench-secret',
  SESSION_SECRET: randomBytes(32).toString('hex'),
  PUBLIC_URL: 'https://railyard.invalid',
  ...process.env,
  NODE_ENV: 'production',
  LOG_LEVEL: 'warn',
});
const pool = createPool(env.DATABASE_URL);
const app = createApp({ env, pool, logger: createLogger('warn') });
const server = createHttpServer(app).listen(0, '127.0.0.1', () => {
  console.log(`listening ${(server.address() as AddressInfo).port}`);
});
process.on('SIGTERM', () => server.close(() => void app.shutdown().then(() => pool.end())));
