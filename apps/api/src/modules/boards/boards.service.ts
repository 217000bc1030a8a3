import { boardPlacement } from '@railyard/board-analysis';
import type { BoardDetail, BoardPlacement, ComponentDetail } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import type { BoardsRepository } from './boards.repository';
import { comparePins } from './pin-order';

export function createBoardsService(repo: BoardsRepository) {
  async function requireBoard(slug: string) {
    const board = await repo.findBoard(slug);
    if (!board) throw AppError.notFound(`Board "${slug}"`);
    return board;
  }

  return {
    listBoards: () => repo.listBoards(),

    async getBoard(slug: string): Promise<BoardDetail> {
      const { id, ...summary } = await requireBoard(slug);
      const counts = await repo.countsByKind(id);
      return {
        ...summary,
        netKindCounts: { power: 0, ground: 0, signal: 0, ...counts.netKindCounts },
        componentKindCounts: counts.componentKindCounts,
        powerLinkCount: counts.powerLinkCount,
      };
    },

    async listNets(slug: string) {
      const board = await requireBoard(slug);
      return { board: board.slug, nets: await repo.listNets(board.id) };
    },

    async listComponents(slug: string, netName: string | undefined) {
      const board = await requireBoard(slug);
      let netId: number | null = null;
      let net: string | null = null;
      if (netName !== undefined) {
        const found = await repo.findNet(board.id, netName);
        if (!found) throw AppError.notFound(`Net "${netName}" on board "${slug}"`);
        netId = found.id;
        net = found.name;
      }
      return { board: board.slug, net, components: await repo.listComponents(board.id, netId) };
    },

    async getPlacement(slug: string): Promise<BoardPlacement> {
      const board = await requireBoard(slug);
      const placement = boardPlacement(await repo.listComponents(board.id, null));
      return { board: board.slug, units: 'mm', ...placement };
    },

    async getComponent(slug: string, refdes: string): Promise<ComponentDetail> {
      const board = await requireBoard(slug);
      const found = await repo.findComponent(board.id, refdes);
      if (!found) throw AppError.notFound(`Component "${refdes}" on board "${slug}"`);
      const { id, pins, ...component } = found;
      return {
        board: board.slug,
        component: { ...component, pins: [...pins].sort((a, b) => comparePins(a.pin, b.pin)) },
        powerLinks: await repo.powerLinksThrough(board.id, id),
        casebook: await repo.casebookTally(board.id, id),
      };
    },
  };
}

export type BoardsService = ReturnType<typeof createBoardsService>;
