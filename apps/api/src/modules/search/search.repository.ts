// Rail search across boards: pg_trgm similarity and substring match on normalised net names and
// aliases, both served by the GIN indexes of migration 0002.
import { sql } from 'drizzle-orm';
import type { NetKind } from '@railyard/shared';
import type { Database } from '../../db/client';

export type RailHit = {
  slug: string;
  title: string;
  name: string;
  kind: NetKind;
  nominal_voltage: number | null;
  alias: string | null;
  score: number;
};

function likePattern(key: string): string {
  return `%${key.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export function createSearchRepository(db: Database) {
  return {
    async searchRails(key: string, limit: number, board?: string): Promise<RailHit[]> {
      const pattern = likePattern(key);
      // the board column sits in the same GIN index as the name (btree_gin)
      const onBoard = board === undefined ? sql`` : sql`AND n.board_id = (SELECT id FROM boards WHERE slug = ${board})`;
      const aliasOnBoard = board === undefined ? sql`` : sql`AND a.board_id = (SELECT id FROM boards WHERE slug = ${board})`;
      // exact key first, then prefix, then substring, then trigram similarity
      const result = await db.execute<RailHit>(sql`
        WITH matches AS (
          SELECT n.id AS net_id, NULL::text AS alias, n.normalized_name AS key
          FROM nets n
          WHERE (n.normalized_name % ${key} OR n.normalized_name LIKE ${pattern}) ${onBoard}
          UNION ALL
          SELECT a.net_id, a.alias, a.normalized_alias
          FROM net_aliases a
          WHERE (a.normalized_alias % ${key} OR a.normalized_alias LIKE ${pattern}) ${aliasOnBoard}
        ),
        scored AS (
          SELECT net_id, alias,
                 CASE WHEN key = ${key} THEN 3
                      WHEN key LIKE ${key.replace(/[\\%_]/g, (c) => `\\${c}`) + '%'} THEN 2
                      WHEN key LIKE ${pattern} THEN 1
                      ELSE 0 END + similarity(key, ${key}) AS score
          FROM matches
        ),
        best AS (
          SELECT DISTINCT ON (net_id) net_id, alias, score FROM scored ORDER BY net_id, score DESC, alias NULLS FIRST
        )
        SELECT b.slug, b.title, n.name, n.kind, n.nominal_voltage, best.alias, round(best.score::numeric, 4)::float8 AS score
        FROM best JOIN nets n ON n.id = best.net_id JOIN boards b ON b.id = n.board_id
        ORDER BY best.score DESC, n.name, b.slug
        LIMIT ${limit}`);
      return result.rows;
    },
  };
}

export type SearchRepository = ReturnType<typeof createSearchRepository>;
