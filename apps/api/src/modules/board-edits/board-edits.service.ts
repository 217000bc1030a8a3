import type { NetUpdate, PowerLinkCreate, PowerLinkRow } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import type { BoardsRepository } from '../boards/boards.repository';
import type { BoardEditsRepository } from './board-edits.repository';

export function createBoardEditsService(deps: {
  boards: BoardsRepository;
  edits: BoardEditsRepository;
  /** drops this process's cached power graph at once (other processes hear the database notification) */
  boardChanged: (boardId: number) => void;
}) {
  const { boards, edits, boardChanged } = deps;

  async function requireBoard(slug: string) {
    const board = await boards.findBoard(slug);
    if (!board) throw AppError.notFound(`Board "${slug}"`);
    return board;
  }
  async function requireNet(boardId: number, slug: string, name: string, field?: string) {
    const net = await boards.findNet(boardId, name);
    if (!net) {
      throw new AppError(404, 'not_found', `Net "${name}" on board "${slug}" was not found`, field ? { field } : undefined);
    }
    return net;
  }

  return {
    async listLinks(slug: string, netName: string | undefined): Promise<PowerLinkRow[]> {
      const board = await requireBoard(slug);
      const net = netName === undefined ? null : await requireNet(board.id, slug, netName);
      return edits.listLinks(board.id, net?.id ?? null);
    },

    async addLink(slug: string, input: PowerLinkCreate, actorId: number): Promise<PowerLinkRow> {
      const board = await requireBoard(slug);
      const from = await requireNet(board.id, slug, input.from, 'from');
      const to = await requireNet(board.id, slug, input.to, 'to');
      if (from.id === to.id) throw AppError.badRequest('A power link joins two different nets', { field: 'to' });
      const viaId = await edits.findComponentId(board.id, input.via);
      if (viaId === null) {
        throw new AppError(404, 'not_found', `Component "${input.via}" on board "${slug}" was not found`, { field: 'via' });
      }
      if (await edits.linkExists(board.id, from.id, to.id, input.via)) {
        throw AppError.conflict(`${from.name} → ${to.name} via ${input.via} is already a power link`);
      }
      const label = `${input.kind} ${from.name} → ${to.name} via ${input.via}`;
      const id = await edits.addLink({ boardId: board.id, fromId: from.id, toId: to.id, viaId, via: input.via, kind: input.kind, actorId, reason: input.reason, label });
      boardChanged(board.id);
      return (await edits.listLinks(board.id, null)).find((l) => l.id === id)!;
    },

    async removeLink(slug: string, linkId: number, actorId: number, reason: string): Promise<void> {
      const board = await requireBoard(slug);
      const removed = await edits.removeLink(board.id, linkId, actorId, reason);
      if (!removed) throw AppError.notFound(`Power link ${linkId} on board "${slug}"`);
      boardChanged(board.id);
    },

    async updateNet(slug: string, netName: string, change: NetUpdate, actorId: number) {
      const board = await requireBoard(slug);
      const net = await requireNet(board.id, slug, netName);
      const { reason, ...fields } = change;
      await edits.updateNet(board.id, net.id, fields, actorId, reason);
      boardChanged(board.id);
      const updated = (await boards.listNets(board.id)).find((n) => n.name === net.name)!;
      return updated;
    },

    async setRoot(slug: string, netName: string, actorId: number, reason: string) {
      const board = await requireBoard(slug);
      const net = await requireNet(board.id, slug, netName, 'net');
      await edits.setRoot(board.id, net.id, actorId, reason, { from: board.rootNet, to: net.name });
      boardChanged(board.id);
      return { rootNet: net.name };
    },
  };
}

export type BoardEditsService = ReturnType<typeof createBoardEditsService>;
