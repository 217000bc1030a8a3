// Loads what the power graph is built from: one board's nets, power links, parts and pins; and which
// board a slug names.
import { sql } from 'drizzle-orm';
import type { PowerGraphInput } from '@railyard/board-analysis';
import type { BoardSide, ComponentKind, NetKind, PowerLinkKind, PowerLinkOrigin } from '@railyard/shared';
import type { Database } from '../../db/client';

export function createPowerTreeRepository(db: Database) {
  return {
    async findBoardId(slug: string): Promise<number | null> {
      const result = await db.execute<{ id: number }>(sql`SELECT id FROM boards WHERE slug = ${slug}`);
      return result.rows[0]?.id ?? null;
    },

    async loadGraphInput(boardId: number): Promise<PowerGraphInput> {
      const [nets, links, parts, pins, root] = await Promise.all([
        db.execute<{ id: number; name: string; kind: NetKind; nominal_voltage: number | null }>(
          sql`SELECT id, name, kind, nominal_voltage FROM nets WHERE board_id = ${boardId}`,
        ),
        db.execute<{ from: string; to: string; via: string; kind: PowerLinkKind; origin: PowerLinkOrigin }>(sql`
          SELECT f.name AS "from", t.name AS "to", l.via_refdes AS via, l.kind, l.origin
          FROM power_links l JOIN nets f ON f.id = l.from_net_id JOIN nets t ON t.id = l.to_net_id
          WHERE l.board_id = ${boardId} ORDER BY l.id`),
        db.execute<{
          id: number;
          refdes: string;
          kind: ComponentKind;
          value: string;
          magnitude: number | null;
          unit: string | null;
          package: string;
          side: BoardSide | null;
        }>(sql`SELECT id, refdes, kind, value, magnitude, unit, package, side FROM components WHERE board_id = ${boardId}`),
        db.execute<{ component_id: number; pin: string; net_id: number | null }>(
          sql`SELECT component_id, pin, net_id FROM pins WHERE board_id = ${boardId}`,
        ),
        db.execute<{ name: string | null }>(
          sql`SELECT r.name FROM boards b LEFT JOIN nets r ON r.id = b.root_net_id WHERE b.id = ${boardId}`,
        ),
      ]);
      const netName = new Map(nets.rows.map((n) => [n.id, n.name]));
      const pinsOf = new Map<number, { pin: string; net: string | null }[]>();
      for (const p of pins.rows) {
        let list = pinsOf.get(p.component_id);
        if (!list) pinsOf.set(p.component_id, (list = []));
        list.push({ pin: p.pin, net: p.net_id === null ? null : (netName.get(p.net_id) ?? null) });
      }
      return {
        nets: nets.rows.map((n) => ({ name: n.name, kind: n.kind, nominalVoltage: n.nominal_voltage })),
        links: links.rows,
        parts: parts.rows.map((c) => ({
          refdes: c.refdes,
          kind: c.kind,
          value: c.value,
          magnitude: c.magnitude,
          unit: c.unit,
          package: c.package,
          side: c.side,
          pins: pinsOf.get(c.id) ?? [],
        })),
        rootNet: root.rows[0]?.name ?? null,
      };
    },
  };
}

export type PowerTreeRepository = ReturnType<typeof createPowerTreeRepository>;
