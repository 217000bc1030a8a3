// Reads of boards and their netlists. The only boards code that talks to the database.
import { eq, sql } from 'drizzle-orm';
import type { BoardSummary, ComponentPin, ComponentRow, NetKind, NetRow, PowerLinkKind, PowerLinkOrigin } from '@railyard/shared';
import type { Database } from '../../db/client';
import { boards } from '../../db/schema';
import { countCases, countSolvedAsCulprit } from '../casebook/casebook.repository';

const summaryColumns = sql`
  b.id, b.slug, b.title, b.device_family, b.board_number, b.revision, b.battery_voltage, b.notes,
  b.created_at, r.name AS root_net,
  (SELECT count(*) FROM nets n WHERE n.board_id = b.id)::int AS net_count,
  (SELECT count(*) FROM components c WHERE c.board_id = b.id)::int AS component_count,
  (SELECT count(*) FROM pins p WHERE p.board_id = b.id)::int AS pin_count`;

interface SummaryRow extends Record<string, unknown> {
  id: number;
  slug: string;
  title: string;
  device_family: string;
  board_number: string;
  revision: string;
  battery_voltage: number | null;
  notes: string;
  created_at: Date | string;
  root_net: string | null;
  net_count: number;
  component_count: number;
  pin_count: number;
}

function toSummary(row: SummaryRow): BoardSummary & { id: number } {
  return {
    id: row.id,
    slug: row.slug,
    title: row.title,
    deviceFamily: row.device_family,
    boardNumber: row.board_number,
    revision: row.revision,
    batteryVoltage: row.battery_voltage,
    notes: row.notes,
    rootNet: row.root_net,
    netCount: row.net_count,
    componentCount: row.component_count,
    pinCount: row.pin_count,
    createdAt: new Date(row.created_at).toISOString(),
  };
}

/** A components row as the component queries select it, with its pins aggregated as JSON. */
type ComponentFields<Pin> = {
  refdes: string;
  kind: ComponentRow['kind'];
  value: string;
  magnitude: number | null;
  unit: string | null;
  tolerance: number | null;
  rated_voltage: number | null;
  package: string;
  side: ComponentRow['side'];
  x: number | null;
  y: number | null;
  rotation: number | null;
  pins: Pin[];
};

function componentFromRow<Pin>(r: ComponentFields<Pin>) {
  return {
    refdes: r.refdes,
    kind: r.kind,
    value: r.value,
    magnitude: r.magnitude,
    unit: r.unit,
    tolerance: r.tolerance,
    ratedVoltage: r.rated_voltage,
    package: r.package,
    side: r.side,
    x: r.x,
    y: r.y,
    rotation: r.rotation,
    pins: r.pins,
  };
}

export function createBoardsRepository(db: Database) {
  return {
    async listBoards(): Promise<BoardSummary[]> {
      const result = await db.execute<SummaryRow>(sql`
        SELECT ${summaryColumns} FROM boards b LEFT JOIN nets r ON r.id = b.root_net_id
        ORDER BY b.title, b.slug`);
      return result.rows.map((row) => {
        const { id: _id, ...summary } = toSummary(row);
        return summary;
      });
    },

    async findBoard(slug: string) {
      const result = await db.execute<SummaryRow>(sql`
        SELECT ${summaryColumns} FROM boards b LEFT JOIN nets r ON r.id = b.root_net_id
        WHERE b.slug = ${slug}`);
      const row = result.rows[0];
      return row ? toSummary(row) : null;
    },

    async findBoardId(slug: string): Promise<number | null> {
      const rows = await db.select({ id: boards.id }).from(boards).where(eq(boards.slug, slug));
      return rows[0]?.id ?? null;
    },

    async countsByKind(boardId: number) {
      const netKinds = await db.execute<{ kind: NetKind; count: number }>(sql`
        SELECT kind, count(*)::int AS count FROM nets WHERE board_id = ${boardId} GROUP BY kind`);
      const componentKinds = await db.execute<{ kind: string; count: number }>(sql`
        SELECT kind, count(*)::int AS count FROM components WHERE board_id = ${boardId} GROUP BY kind`);
      const links = await db.execute<{ count: number }>(sql`
        SELECT count(*)::int AS count FROM power_links WHERE board_id = ${boardId}`);
      return {
        netKindCounts: Object.fromEntries(netKinds.rows.map((r) => [r.kind, r.count])),
        componentKindCounts: Object.fromEntries(componentKinds.rows.map((r) => [r.kind, r.count])),
        powerLinkCount: links.rows[0]?.count ?? 0,
      };
    },

    async listNets(boardId: number): Promise<NetRow[]> {
      const result = await db.execute<{
        name: string;
        normalized_name: string;
        kind: NetKind;
        nominal_voltage: number | null;
        description: string;
        aliases: string[];
        component_count: number;
        pin_count: number;
      }>(sql`
        SELECT n.name, n.normalized_name, n.kind, n.nominal_voltage, n.description,
               COALESCE(a.aliases, '{}') AS aliases,
               COALESCE(p.component_count, 0)::int AS component_count,
               COALESCE(p.pin_count, 0)::int AS pin_count
        FROM nets n
        LEFT JOIN (
          SELECT net_id, array_agg(alias ORDER BY alias) AS aliases
          FROM net_aliases WHERE board_id = ${boardId} GROUP BY net_id
        ) a ON a.net_id = n.id
        LEFT JOIN (
          SELECT net_id, count(DISTINCT component_id) AS component_count, count(*) AS pin_count
          FROM pins WHERE board_id = ${boardId} AND net_id IS NOT NULL GROUP BY net_id
        ) p ON p.net_id = n.id
        WHERE n.board_id = ${boardId}
        ORDER BY n.name`);
      return result.rows.map((r) => ({
        name: r.name,
        normalizedName: r.normalized_name,
        kind: r.kind,
        nominalVoltage: r.nominal_voltage,
        description: r.description,
        aliases: r.aliases,
        componentCount: r.component_count,
        pinCount: r.pin_count,
      }));
    },

    /** A net by its printed name or one of its aliases. */
    async findNet(boardId: number, name: string) {
      const result = await db.execute<{ id: number; name: string }>(sql`
        SELECT id, name FROM nets WHERE board_id = ${boardId} AND name = ${name}
        UNION ALL
        SELECT n.id, n.name FROM net_aliases a JOIN nets n ON n.id = a.net_id
        WHERE a.board_id = ${boardId} AND a.alias = ${name}
        LIMIT 1`);
      return result.rows[0] ?? null;
    },

    /** Components of a board, or only those with a pin on one net; each with all its pins. */
    async listComponents(boardId: number, netId: number | null): Promise<ComponentRow[]> {
      const filter =
        netId === null
          ? sql``
          : sql`AND c.id IN (SELECT component_id FROM pins WHERE net_id = ${netId})`;
      const result = await db.execute<ComponentFields<ComponentRow['pins'][number]>>(sql`
        SELECT c.refdes, c.kind, c.value, c.magnitude, c.unit, c.tolerance, c.rated_voltage,
               c.package, c.side, c.x, c.y, c.rotation,
               COALESCE((
                 SELECT json_agg(json_build_object('pin', p.pin, 'net', n.name, 'x', p.x, 'y', p.y)
                                 ORDER BY p.pin)
                 FROM pins p LEFT JOIN nets n ON n.id = p.net_id
                 WHERE p.component_id = c.id
               ), '[]') AS pins
        FROM components c
        WHERE c.board_id = ${boardId} ${filter}
        ORDER BY c.refdes`);
      return result.rows.map(componentFromRow);
    },

    /**
     * One part by refdes in any letter case, as case write-ups name parts; the exact spelling wins
     * when a board has two that differ only in case. Pins come in text order: the caller sorts them.
     */
    async findComponent(boardId: number, refdes: string) {
      const result = await db.execute<ComponentFields<ComponentPin> & { id: number }>(sql`
        SELECT c.id, c.refdes, c.kind, c.value, c.magnitude, c.unit, c.tolerance, c.rated_voltage,
               c.package, c.side, c.x, c.y, c.rotation,
               COALESCE((
                 SELECT json_agg(json_build_object(
                          'pin', p.pin, 'net', n.name, 'netKind', n.kind, 'ground', COALESCE(n.kind = 'ground', false),
                          'nominalVoltage', n.nominal_voltage, 'x', p.x, 'y', p.y)
                        ORDER BY p.pin)
                 FROM pins p LEFT JOIN nets n ON n.id = p.net_id
                 WHERE p.component_id = c.id
               ), '[]') AS pins
        FROM components c
        WHERE c.board_id = ${boardId} AND upper(c.refdes) = upper(${refdes})
        ORDER BY (c.refdes = ${refdes}) DESC, c.refdes
        LIMIT 1`);
      const r = result.rows[0];
      if (!r) return null;
      return { id: r.id, ...componentFromRow(r) };
    },

    /** The part's record in the casebook, counted by the same queries as the casebook's own lists. */
    /** Power links through one part, from the source rail's side, in name order. */
    async powerLinksThrough(boardId: number, componentId: number) {
      const result = await db.execute<{ from: string; to: string; kind: PowerLinkKind; origin: PowerLinkOrigin }>(sql`
        SELECT f.name AS "from", t.name AS "to", l.kind, l.origin
        FROM power_links l JOIN nets f ON f.id = l.from_net_id JOIN nets t ON t.id = l.to_net_id
        WHERE l.board_id = ${boardId} AND l.via_component_id = ${componentId}
        ORDER BY f.name, t.name`);
      return result.rows;
    },

    async casebookTally(boardId: number, componentId: number) {
      const [cases, solvedAsCulprit] = await Promise.all([
        countCases(db, { boardId, status: 'published', componentId }),
        countSolvedAsCulprit(db, componentId),
      ]);
      return { cases, solvedAsCulprit };
    },
  };
}

export type BoardsRepository = ReturnType<typeof createBoardsRepository>;
