// Rate limits whose counters live in PostgreSQL, so every API process shares them.
import rateLimit, { ipKeyGenerator, type Options, type Store, type IncrementResponse } from 'express-rate-limit';
import type pg from 'pg';

/** A fixed-window store on the app's own pool (one upsert per request). */
export class PostgresRateLimitStore implements Store {
  private windowMs = 60_000;
  localKeys = false;

  constructor(
    private readonly pool: pg.Pool,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const { rows } = await this.pool.query<{ hits: number; reset_at: Date }>(
      `INSERT INTO rate_limit_hits (key, hits, reset_at) VALUES ($1, 1, now() + $2 * interval '1 millisecond')
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN 1 ELSE rate_limit_hits.hits + 1 END,
         reset_at = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_hits.reset_at END
       RETURNING hits, reset_at`,
      [this.prefix + key, this.windowMs],
    );
    return { totalHits: rows[0]!.hits, resetTime: rows[0]!.reset_at };
  }

  async decrement(key: string): Promise<void> {
    await this.pool.query('UPDATE rate_limit_hits SET hits = greatest(hits - 1, 0) WHERE key = $1', [this.prefix + key]);
  }

  async resetKey(key: string): Promise<void> {
    await this.pool.query('DELETE FROM rate_limit_hits WHERE key = $1', [this.prefix + key]);
  }
}

export function createRateLimit(pool: pg.Pool, name: string, limit: number, windowMs: number) {
  return rateLimit({
    windowMs,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PostgresRateLimitStore(pool, `${name}:`),
    // signed-in people are counted per account, others per address
    keyGenerator: (req) => (req.user ? `user:${req.user.id}` : `ip:${ipKeyGenerator(req.ip ?? '')}`),
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate_limited', message: `Too many requests (${name}); try again shortly` } });
    },
  });
}
