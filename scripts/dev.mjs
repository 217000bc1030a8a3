// npm run dev — the API under `tsx watch` on API_PORT (3001) and the Vite dev server,
// which proxies /api to it (vite.config.ts reads API_PORT). Same database as npm start.
import {
  appCluster,
  ensureDependencies,
  ensurePostgres,
  portFromEnv,
  requireFile,
  runTypeScript,
  startCluster,
} from './lib/bootstrap.mjs';
import { complain, say } from './lib/progress.mjs';
import {
  StepError,
  forwardSignals,
  localBin,
  runCommand,
  stopChildren,
} from './lib/run-command.mjs';

async function main() {
  const apiPort = String(portFromEnv('API_PORT', 3001));
  forwardSignals();

  await ensureDependencies();
  const { binDir } = await ensurePostgres();
  const { databaseUrl } = await startCluster({ binDir, ...appCluster, port: appCluster.port() });
  const env = { ...process.env, DATABASE_URL: databaseUrl, API_PORT: apiPort };

  await runTypeScript(
    'Applying migrations',
    'apps/api/src/db/migrate.ts',
    env,
    'migrate the database',
  );
  await runTypeScript('Loading demo boards', 'seed/load-demo.ts', env, 'load the demo boards');

  const serverFile = 'apps/api/src/server.ts';
  requireFile(serverFile, 'start the API');
  say(
    `API on http://127.0.0.1:${apiPort}/ (restarts on change); the Vite dev server prints its own URL`,
  );
  const api = runCommand(localBin('tsx'), ['watch', serverFile], {
    env: { ...env, PORT: apiPort, NODE_ENV: 'development' },
    detached: true,
  });
  const web = runCommand(localBin('vite'), [], { env, detached: true });

  // When either one stops, stop the other too: half a dev setup only confuses.
  const first = await Promise.race([
    api.then((r) => ({ ...r, name: 'API' })),
    web.then((r) => ({ ...r, name: 'Vite' })),
  ]);
  say(`${first.name} stopped (exit code ${first.code}); stopping the rest`);
  stopChildren();
  await Promise.allSettled([api, web]);
  return first.code;
}

main()
  .then((code) => process.exit(code))
  .catch((error) => {
    complain(error instanceof StepError ? error.message : (error?.stack ?? String(error)));
    process.exit(error instanceof StepError ? error.exitCode : 1);
  });
