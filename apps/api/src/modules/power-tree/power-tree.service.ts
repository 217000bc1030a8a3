import type { NetDetail, PowerTree, TreeDirection } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import type { BoardsRepository } from '../boards/boards.repository';
import type { PowerGraphCache, TraceJson } from './power-graph-cache';

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

    /**
     * A trace as the JSON text of a `PowerTree`, all from the graph cache once asked before: a trace
     * from the root reads nothing from the database (the board summary alone, which counts every
     * pin, cost more than the whole trace), one from a named rail only looks the name up.
     */
    async getTreeJson(slug: string, name: string | null, direction: TreeDirection, depth: number): Promise<TraceJson> {
      const board = await cache.boardBySlug(slug);
      if (!board) throw AppError.notFound(`Board "${slug}"`);
      let start: string;
      if (name === null) {
        if (!board.rootNet) throw new AppError(404, 'not_found', `Board "${slug}" has no root net set`);
        start = board.rootNet;
      } else {
        start = await requireNet(board.id, slug, name);
      }
      return board.traceJson(`${slug}|${direction}|${depth}|${start}`, () => {
        const tree: PowerTree = { board: slug, ...board.graph.trace(start, direction, depth) };
        return JSON.stringify(tree);
      });
    },
  };
}

export type PowerTreeService = ReturnType<typeof createPowerTreeService>;
