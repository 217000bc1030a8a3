// API tests run the real Express app on an ephemeral port against the real PostgreSQL database
// that `npm test` started and migrated (DATABASE_URL).
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { createApp } from '../../apps/api/src/app';
import { readEnv, type Env } from '../../apps/api/src/config/env';
import { createLogger } from '../../apps/api/src/lib/logger';

export function testEnv(overrides: Partial<Env> = {}): Env {
  const env = readEnv({ ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'silent', STATIC_DIR: '' });
  return { ...env, ...overrides };
}

export function createTestApp(overrides: Partial<Env> = {}) {
  const env = testEnv(overrides);
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
  const app = createApp({ env, pool, logger: createLogger('silent') });
  return {
    app,
    pool,
    env,
    close: async () => {
      await app.shutdown();
      await pool.end();
    },
  };
}

/** A slug no other test uses, so each test owns its rows. */
export function uniqueSlug(prefix = 'test'): string {
  return `${prefix}-${randomBytes(4).toString('hex')}`;
}

/** Row counts of every netlist table for one board (by slug), to prove a failed import changed nothing. */
export async function boardRowCounts(pool: pg.Pool, slug: string) {
  const { rows } = await pool.query<Record<string, number>>(
    `SELECT
       (SELECT count(*) FROM boards WHERE slug = $1)::int AS boards,
       (SELECT count(*) FROM nets n JOIN boards b ON b.id = n.board_id WHERE b.slug = $1)::int AS nets,
       (SELECT count(*) FROM net_aliases a JOIN boards b ON b.id = a.board_id WHERE b.slug = $1)::int AS aliases,
       (SELECT count(*) FROM components c JOIN boards b ON b.id = c.board_id WHERE b.slug = $1)::int AS components,
       (SELECT count(*) FROM pins p JOIN boards b ON b.id = p.board_id WHERE b.slug = $1)::int AS pins,
       (SELECT count(*) FROM power_links l JOIN boards b ON b.id = l.board_id WHERE b.slug = $1)::int AS links`,
    [slug],
  );
  return rows[0]!;
}
