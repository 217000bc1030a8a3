// The API as its own process for HTTP benchmarks, so the load generator does not share its event loop.
// Prints "listening <port>" once ready.
import type { AddressInfo } from 'node:net';
import { createApp } from '../../apps/api/src/app';
import { readEnv } from '../../apps/api/src/config/env';
import { createPool } from '../../apps/api/src/db/client';
import { createLogger } from '../../apps/api/src/lib/logger';

const env = readEnv({ ...process.env, NODE_ENV: 'production', LOG_LEVEL: 'warn' });
const pool = createPool(env.DATABASE_URL);
const app = createApp({ env, pool, logger: createLogger('warn') });
const server = app.listen(0, '127.0.0.1', () => {
  console.log(`listening ${(server.address() as AddressInfo).port}`);
});
process.on('SIGTERM', () => server.close(() => void app.shutdown().then(() => pool.end())));
