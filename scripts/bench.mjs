// npm run bench — a durable private cluster (like npm start's, not the test one), migrations, then the
// benchmarks in tests/bench, which write docs/performance.md. The bench cluster is removed afterwards.
import path from 'node:path';
import {
  ensureDependencies,
  ensurePostgres,
  findFreePort,
  removeCluster,
  runTypeScript,
  startCluster,
} from './lib/bootstrap.mjs';
import { complain, say } from './lib/progress.mjs';
import { workDir } from './lib/repo-paths.mjs';
import { StepError } from './lib/run-command.mjs';

async function main() {
  await ensureDependencies();
  const env = { ...process.env };
  const dataDir = path.join(workDir, `pg-bench-${process.pid}`, 'data');
  let started = false;
  try {
    if (!env.DATABASE_URL) {
      const { binDir } = await ensurePostgres();
      const { databaseUrl } = await startCluster({ binDir, dataDir, port: await findFreePort(), database: 'railyard_bench' });
      started = true;
      env.DATABASE_URL = databaseUrl;
    }
    await runTypeScript('Applying migrations', 'apps/api/src/db/migrate.ts', env, 'migrate the bench database');
    say('Running benchmarks');
    await runTypeScript('Benchmarks', 'tests/bench/run-benchmarks.ts', env, 'run the benchmarks');
    say('Results written to docs/performance.md');
  } finally {
    if (started) await removeCluster(dataDir);
  }
}

main().catch((error) => {
  complain(error instanceof StepError ? error.message : (error?.stack ?? String(error)));
  process.exit(1);
});
