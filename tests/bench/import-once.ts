// One end-to-end import of a board from disk (read + parse + check + database), in a fresh process so
// its peak memory is the import's own. The source is a folder of netlist.ipc, parts.csv and
// annotations.json, or one `railyard-board` JSON file. Prints one JSON line.
import path from 'node:path';
import { createServices } from '../../apps/api/src/app';
import { readEnv } from '../../apps/api/src/config/env';
import { createPool } from '../../apps/api/src/db/client';
import { createLogger } from '../../apps/api/src/lib/logger';
import { importFromDisk } from '../../apps/api/src/modules/imports/import-files';

const [source, slug] = process.argv.slice(2);
if (!source || !slug || !process.env.DATABASE_URL) {
  throw new Error('usage: DATABASE_URL=… tsx tests/bench/import-once.ts <dir | board.json> <slug>');
}
const files = source.endsWith('.json')
  ? { netlist: source }
  : {
      netlist: path.join(source, 'netlist.ipc'),
      parts: path.join(source, 'parts.csv'),
      annotations: path.join(source, 'annotations.json'),
    };
const pool = createPool(process.env.DATABASE_URL);
const services = createServices({ env: readEnv(process.env), pool, logger: createLogger('warn') });
const rssBefore = process.memoryUsage().rss;
const started = performance.now();
const job = await importFromDisk(services.imports, {
  slug,
  replace: false,
  ...files,
  enteredBy: 'import:bench',
});
const ms = performance.now() - started;
await pool.end();
if (job.status !== 'succeeded') throw new Error(`import failed: ${JSON.stringify(job.errors)}`);
console.log(
  JSON.stringify({
    ms,
    // maxRSS is in kilobytes: the process's peak, including Node itself
    peakRssMb: process.resourceUsage().maxRSS / 1024,
    baseRssMb: rssBefore / 1024 / 1024,
    summary: job.summary,
  }),
);
