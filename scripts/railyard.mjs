// npm run railyard -- <command> — Railyard's command-line tools against the local cluster
// (started and migrated when needed), or against DATABASE_URL when it is set.
import {
  appCluster,
  ensureDependencies,
  ensurePostgres,
  runTypeScript,
  startCluster,
} from './lib/bootstrap.mjs';
import { complain } from './lib/progress.mjs';
import { StepError, localBin, runCommand } from './lib/run-command.mjs';

async function main(args) {
  await ensureDependencies();
  const env = { ...process.env };
  if (!env.DATABASE_URL) {
    const { binDir } = await ensurePostgres();
    const { databaseUrl } = await startCluster({ binDir, ...appCluster, port: appCluster.port() });
    env.DATABASE_URL = databaseUrl;
  }
  await runTypeScript('Applying migrations', 'apps/api/src/db/migrate.ts', env, 'migrate the database');
  const { code } = await runCommand(localBin('tsx'), ['apps/api/src/cli.ts', ...args], { env });
  return code;
}

main(process.argv.slice(2))
  .then((code) => process.exit(code ?? 0))
  .catch((error) => {
    complain(error instanceof StepError ? error.message : (error?.stack ?? String(error)));
    process.exit(error instanceof StepError ? error.exitCode : 1);
  });
