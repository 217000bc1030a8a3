// Moderator edits of a board's power tree. Each edit commits with its audit row, bumps the board's
// updated_at and notifies every API process to drop its cached power graph.
import { and, eq, sql } from 'drizzle-orm';
import type { NetKind, PowerLinkRow } from '@railyard/shared';
import type { Database } from '../../db/client';
import { boards, components, nets, powerLinks } from '../../db/schema';
import { writeAudit } from '../audit/audit.repository';
import { boardChangedChannel } from '../power-tree/power-graph-cache';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

async function touchBoard(tx: Tx, boardId: number) {
  await tx.update(boards).set({ updatedAt: new Date() }).where(eq(boards.id, boardId));
  await tx.execute(sql`SELECT pg_notify(${boardChangedChannel}, ${String(boardId)})`);
}

export function createBoardEditsRepository(db: Database) {
  return {
    async listLinks(boardId: number, netId: number | null): Promise<PowerLinkRow[]> {
      const result = await db.execute<{
        id: number;
        from: string;
        to: string;
        via: string;
        kind: PowerLinkRow['kind'];
        origin: PowerLinkRow['origin'];
        entered_by: string | null;
      }>(sql`
        SELECT l.id, f.name AS "from", t.name AS "to", l.via_refdes AS via, l.kind, l.origin, l.entered_by
        FROM power_links l JOIN nets f ON f.id = l.from_net_id JOIN nets t ON t.id = l.to_net_id
        WHERE l.board_id = ${boardId} ${netId === null ? sql`` : sql`AND (l.from_net_id = ${netId} OR l.to_net_id = ${netId})`}
        ORDER BY f.name, t.name, l.via_refdes`);
      return result.rows.map(({ entered_by, ...r }) => ({ ...r, enteredBy: entered_by }));
    },

    async findComponentId(boardId: number, refdes: string): Promise<number | null> {
      const rows = await db
        .select({ id: components.id })
        .from(components)
        .where(and(eq(components.boardId, boardId), eq(components.refdes, refdes)));
      return rows[0]?.id ?? null;
    },

    async linkExists(boardId: number, fromId: number, toId: number, via: string): Promise<boolean> {
      const rows = await db
        .select({ id: powerLinks.id })
        .from(powerLinks)
        .where(
          and(eq(powerLinks.boardId, boardId), eq(powerLinks.fromNetId, fromId), eq(powerLinks.toNetId, toId), eq(powerLinks.viaRefdes, via)),
        );
      return rows.length > 0;
    },

    async addLink(input: {
      boardId: number;
      fromId: number;
      toId: number;
      viaId: number | null;
      via: string;
      kind: PowerLinkRow['kind'];
      actorId: number;
      reason: string;
      label: string;
    }): Promise<number> {
      return db.transaction(async (tx) => {
        const [row] = await tx
          .insert(powerLinks)
          .values({
            boardId: input.boardId,
            fromNetId: input.fromId,
            toNetId: input.toId,
            viaComponentId: input.viaId,
            viaRefdes: input.via,
            kind: input.kind,
            origin: 'entered',
            enteredBy: `user:${input.actorId}`,
          })
          .returning({ id: powerLinks.id });
        await writeAudit(tx, {
          actorId: input.actorId,
          action: 'power-link.add',
          targetType: 'power-link',
          targetId: String(row!.id),
          reason: input.reason,
          details: { board: input.boardId, link: input.label },
        });
        await touchBoard(tx, input.boardId);
        return row!.id;
      });
    },

    async removeLink(boardId: number, linkId: number, actorId: number, reason: string): Promise<PowerLinkRow | null> {
      const existing = (await this.listLinks(boardId, null)).find((l) => l.id === linkId);
      if (!existing) return null;
      await db.transaction(async (tx) => {
        await tx.delete(powerLinks).where(and(eq(powerLinks.id, linkId), eq(powerLinks.boardId, boardId)));
        await writeAudit(tx, {
          actorId,
          action: 'power-link.remove',
          targetType: 'power-link',
          targetId: String(linkId),
          reason,
          details: { board: boardId, link: `${existing.kind} ${existing.from} → ${existing.to} via ${existing.via}`, origin: existing.origin },
        });
        await touchBoard(tx, boardId);
      });
      return existing;
    },

    async updateNet(
      boardId: number,
      netId: number,
      change: { nominalVoltage?: number | null; description?: string; kind?: NetKind },
      actorId: number,
      reason: string,
    ) {
      await db.transaction(async (tx) => {
        const [before] = await tx.select().from(nets).where(eq(nets.id, netId));
        await tx.update(nets).set(change).where(eq(nets.id, netId));
        await writeAudit(tx, {
          actorId,
          action: 'net.update',
          targetType: 'net',
          targetId: String(netId),
          reason,
          details: {
            board: boardId,
            net: before!.name,
            before: Object.fromEntries(Object.keys(change).map((k) => [k, before![k as keyof typeof before]])),
            after: change,
          },
        });
        await touchBoard(tx, boardId);
      });
    },

    async setRoot(boardId: number, netId: number, actorId: number, reason: string, label: { from: string | null; to: string }) {
      await db.transaction(async (tx) => {
        await tx.update(boards).set({ rootNetId: netId, rootNetEntered: true }).where(eq(boards.id, boardId));
        await writeAudit(tx, {
          actorId,
          action: 'board.root',
          targetType: 'board',
          targetId: String(boardId),
          reason,
          details: label,
        });
        await touchBoard(tx, boardId);
      });
    },
  };
}


export type BoardEditsRepository = ReturnType<typeof createBoardEditsRepository>;
