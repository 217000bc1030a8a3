// Loads the demo boards in seed/boards/ when the database has no boards yet. Run by `npm start`.
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { createServices } from '../apps/api/src/app';
import { readEnv, usesFakeGitHub } from '../apps/api/src/config/env';
import { demoAccountIds, demoAccounts } from '../apps/api/src/dev/fake-github/demo-accounts';
import { createPool } from '../apps/api/src/db/client';
import { createLogger } from '../apps/api/src/lib/logger';
import { importFromDisk } from '../apps/api/src/modules/imports/import-files';
import { loadDemoCases } from './demo-cases';
import type { ImportsService } from '../apps/api/src/modules/imports/imports.service';
import type pg from 'pg';
import type { UserRole } from '@railyard/shared';

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

/** The demo people of the local fake GitHub, one of each role, so every screen can be tried. */
const demoRoles: Record<number, UserRole> = {
  [demoAccountIds.member]: 'member',
  [demoAccountIds.secondMember]: 'member',
  [demoAccountIds.moderator]: 'moderator',
  [demoAccountIds.adminToBe]: 'admin',
};

/** Adds the demo users that are missing; never changes an existing account. Returns the logins added. */
export async function loadDemoUsers(pool: pg.Pool): Promise<string[]> {
  const added: string[] = [];
  for (const account of demoAccounts) {
    const role = demoRoles[account.id];
    if (!role) continue;
    const primary = account.emails.find((e) => e.primary && e.verified);
    const { rowCount } = await pool.query(
      `INSERT INTO users (github_id, login, name, email, role) VALUES ($1, $2, $3, $4, $5)
       ON CONFLICT (github_id) DO NOTHING`,
      [account.id, account.login, account.name ?? '', primary?.email ?? null, role],
    );
    if (rowCount) added.push(`${account.login} (${role})`);
  }
  return added;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const env = readEnv(process.env);
  const pool = createPool(env.DATABASE_URL);
  try {
    const { rows } = await pool.query<{ count: number }>('SELECT count(*)::int AS count FROM boards');
    if ((rows[0]?.count ?? 0) > 0) {
      console.log(`demo data: the database already has ${rows[0]!.count} board(s); nothing loaded`);
    } else {
      const slugs = await loadDemoBoards(createServices({ env, pool, logger: createLogger('warn') }).imports);
      console.log(`demo data: loaded ${slugs.join(', ')}`);
    }
    // Demo accounts exist only on the local fake GitHub: with a real OAuth app these ids belong to
    // strangers, so no role is ever granted by them there.
    if (usesFakeGitHub(env)) {
      const users = await loadDemoUsers(pool);
      if (users.length > 0) console.log(`demo users: ${users.join(', ')}`);
      // written by the demo people, so only where they exist
      const cases = await loadDemoCases(pool);
      if (cases.length > 0) console.log(`demo cases: ${cases.length} write-ups`);
    }
  } finally {
    await pool.end();
  }
}
