// Loads the demo boards in seed/boards/ when the database has no boards yet. Run by `npm start`.
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { createServices } from '../apps/api/src/app';
import { createPool } from '../apps/api/src/db/client';
import { createLogger } from '../apps/api/src/lib/logger';
import { importFromDisk } from '../apps/api/src/modules/imports/import-files';
import type { ImportsService } from '../apps/api/src/modules/imports/imports.service';

const boardsDir = fileURLToPath(new URL('./boards', import.meta.url));

/** Imports every demo board folder; returns the slugs loaded. */
export async function loadDemoBoards(imports: ImportsService): Promise<string[]> {
  const loaded: string[] = [];
  for (const slug of readdirSync(boardsDir).sort()) {
    const dir = path.join(boardsDir, slug);
    const at = (name: string) => (existsSync(path.join(dir, name)) ? path.join(dir, name) : undefined);
    const netlist = at('netlist.ipc') ?? at('board.json');
    if (!netlist) continue;
    const job = await importFromDisk(imports, {
      slug,
      replace: false,
      netlist,
      parts: netlist.endsWith('.ipc') ? at('parts.csv') : undefined,
      annotations: netlist.endsWith('.ipc') ? at('annotations.json') : undefined,
      enteredBy: 'import:demo',
    });
    if (job.status !== 'succeeded') {
      throw new Error(`demo board ${slug} failed to import: ${job.errors.map((e) => e.message).join('; ')}`);
    }
    loaded.push(slug);
  }
  return loaded;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set');
  const pool = createPool(url);
  try {
    const { rows } = await pool.query<{ count: number }>('SELECT count(*)::int AS count FROM boards');
    if ((rows[0]?.count ?? 0) > 0) {
      console.log(`demo data: the database already has ${rows[0]!.count} board(s); nothing loaded`);
    } else {
      const slugs = await loadDemoBoards(createServices({ pool, logger: createLogger('warn') }).imports);
      console.log(`demo data: loaded ${slugs.join(', ')}`);
    }
  } finally {
    await pool.end();
  }
}
