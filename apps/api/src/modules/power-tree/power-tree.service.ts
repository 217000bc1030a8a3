import type { NetDetail, PowerTree, TreeDirection } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import type { BoardsRepository } from '../boards/boards.repository';
import type { PowerGraphCache } from './power-graph-cache';

export function createPowerTreeService(deps: { boards: BoardsRepository; cache: PowerGraphCache }) {
  const { boards, cache } = deps;

  async function requireBoard(slug: string) {
    const board = await boards.findBoard(slug);
    if (!board) throw AppError.notFound(`Board "${slug}"`);
    return board;
  }

  /** A net by printed name or alias; the graph knows printed names only. */
  async function requireNet(boardId: number, slug: string, name: string) {
    const net = await boards.findNet(boardId, name);
    if (!net) throw AppError.notFound(`Net "${name}" on board "${slug}"`);
    return net.name;
  }

  return {
    async getNetDetail(slug: string, name: string): Promise<NetDetail> {
      const board = await requireBoard(slug);
      const netName = await requireNet(board.id, slug, name);
      const [graph, nets] = await Promise.all([cache.get(board.id), boards.listNets(board.id)]);
      const net = nets.find((n) => n.name === netName)!;
      return {
        board: board.slug,
        rootNet: board.rootNet,
        net,
        isRoot: board.rootNet === netName,
        coupledGroup: graph.coupledGroup(netName),
        upstreamPaths: graph.upstreamPaths(netName, 5),
        linksIn: graph.linksIn(netName),
        linksOut: graph.linksOut(netName),
        loads: graph.loads(netName),
      };
    },

    async getTree(slug: string, name: string | null, direction: TreeDirection, depth: number): Promise<PowerTree> {
      const board = await requireBoard(slug);
      let start: string;
      if (name === null) {
        if (!board.rootNet) throw new AppError(404, 'not_found', `Board "${slug}" has no root net set`);
        start = board.rootNet;
      } else {
        start = await requireNet(board.id, slug, name);
      }
      const graph = await cache.get(board.id);
      return { board: board.slug, ...graph.trace(start, direction, depth) };
    },
  };
}

export type PowerTreeService = ReturnType<typeof createPowerTreeService>;
