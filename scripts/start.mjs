// npm start — from a fresh checkout to a running Railyard: dependencies, PostgreSQL,
// migrations, demo boards, the client build, then the server in production mode.
// Ctrl-C stops the server; the database keeps running until `npm run db:stop`.
import {
  appCluster,
  ensureDependencies,
  ensurePostgres,
  portFromEnv,
  requireFile,
  runTypeScript,
  startCluster,
} from './lib/bootstrap.mjs';
import { complain, say, warn } from './lib/progress.mjs';
import { StepError, forwardSignals, localBin, runCommand } from './lib/run-command.mjs';
import { waitForHealth } from './lib/wait-for-health.mjs';

const STATIC_DIR = 'dist/web';

async function main() {
  const port = portFromEnv('PORT', 3000);
  let stopping = false;
  forwardSignals(() => {
    stopping = true;
  });

  say('Checking dependencies');
  await ensureDependencies();
  say('Checking PostgreSQL');
  const { binDir } = await ensurePostgres();
  const { databaseUrl } = await startCluster({ binDir, ...appCluster, port: appCluster.port() });
  const env = { ...process.env, DATABASE_URL: databaseUrl };

  say('Applying database migrations');
  await runTypeScript(
    'Applying migrations',
    'apps/api/src/db/migrate.ts',
    env,
    'migrate the database',
  );
  say('Loading demo boards (only into an empty database)');
  await runTypeScript('Loading demo boards', 'seed/load-demo.ts', env, 'load the demo boards');
  say('Building the web client');
  const build = await runCommand(localBin('vite'), ['build'], { env });
  if (build.code !== 0)
    throw new StepError(
      `building the web client (vite build) failed with code ${build.code}`,
      build.code,
    );
  if (stopping) return 130;

  const serverFile = 'apps/api/src/server.ts';
  requireFile(serverFile, 'start the server');
  say('Starting the server');
  const server = runCommand(localBin('tsx'), [serverFile], {
    env: { ...env, PORT: String(port), STATIC_DIR },
    detached: true,
  });
  const url = `http://127.0.0.1:${port}/`;
  waitForHealth(`${url}api/health`, server).then((healthy) => {
    if (healthy === true) say(`Railyard is running at ${url}  (Ctrl-C stops it)`);
    else if (healthy === false)
      warn(`${url}api/health did not answer 200 within a minute; the server is still running`);
  });
  const { code } = await server;
  say('Server stopped. PostgreSQL keeps running: npm run db:stop stops it.');
  return code;
}

main()
  .then((code) => process.exit(code))
  .catch((error) => {
    complain(error instanceof StepError ? error.message : (error?.stack ?? String(error)));
    process.exit(error instanceof StepError ? error.exitCode : 1);
  });
