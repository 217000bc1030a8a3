import { readEnv } from './config/env';
import { createApp } from './app';
import { createPool } from './db/client';
import { createHttpServer } from './lib/http-server';
import { createLogger } from './lib/logger';

const env = readEnv();
const logger = createLogger(env.LOG_LEVEL);
const pool = createPool(env.DATABASE_URL);
const app = createApp({ env, pool, logger });

const server = createHttpServer(app).listen(env.PORT, env.HOST, () => {
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : env.PORT;
  logger.info({ port }, 'Railyard API listening');
  console.log(`Railyard is serving http://${env.HOST}:${port}/`);
});

function shutdown() {
  server.close(() => {
    void app
      .shutdown()
      .then(() => pool.end())
      .then(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 3000).unref();
}
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
