// npm run db:start | db:stop — the PostgreSQL cluster behind `npm start` and `npm run dev`.
// `node scripts/db.mjs url` prints its DATABASE_URL, for psql or a one-off script.
import {
  appCluster,
  ensurePostgres,
  startCluster,
  stopCluster,
  storedDatabaseUrl,
} from './lib/bootstrap.mjs';
import { complain, say } from './lib/progress.mjs';
import { StepError } from './lib/run-command.mjs';

const USAGE = 'usage: node scripts/db.mjs start|stop|url';

async function main(command) {
  switch (command) {
    case 'start': {
      const { binDir } = await ensurePostgres();
      const { databaseUrl } = await startCluster({
        binDir,
        ...appCluster,
        port: appCluster.port(),
      });
      say(`DATABASE_URL=${databaseUrl}`);
      return;
    }
    case 'stop':
      say(
        (await stopCluster(appCluster.dataDir))
          ? 'PostgreSQL stopped'
          : 'PostgreSQL was not running',
      );
      return;
    case 'url': {
      const url =
        process.env.DATABASE_URL ?? storedDatabaseUrl(appCluster.dataDir, appCluster.database);
      if (!url) throw new StepError('no database has been created yet: run npm run db:start first');
      console.log(url);
      return;
    }
    default:
      throw new StepError(USAGE, 2);
  }
}

main(process.argv[2]).catch((error) => {
  complain(error instanceof StepError ? error.message : (error?.stack ?? String(error)));
  process.exit(error instanceof StepError ? error.exitCode : 1);
});
