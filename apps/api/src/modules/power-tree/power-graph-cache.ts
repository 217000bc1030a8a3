// One power graph per board, built on first use and kept in the API process. Any write to a board's
// netlist or links sends NOTIFY railyard_board_changed (inside its transaction, so it arrives at commit),
// and every process listening drops that board's graph. If the listening connection is lost, the whole
// cache is dropped and listening starts again, so a missed notification cannot leave a stale graph.
import type pg from 'pg';
import { createPowerGraph, type PowerGraph } from '@railyard/board-analysis';
import type { Logger } from '../../lib/logger';
import type { PowerTreeRepository } from './power-tree.repository';

export const boardChangedChannel = 'railyard_board_changed';

export function createPowerGraphCache(deps: { pool: pg.Pool; repo: PowerTreeRepository; logger: Logger }) {
  const { pool, repo, logger } = deps;
  const graphs = new Map<number, Promise<PowerGraph>>();
  let listener: pg.PoolClient | null = null;
  let listening: Promise<void> | null = null;
  let closed = false;

  async function listen(): Promise<void> {
    const client = await pool.connect();
    client.on('notification', (message) => {
      const boardId = Number(message.payload);
      if (Number.isInteger(boardId)) graphs.delete(boardId);
      else graphs.clear();
    });
    client.on('error', (err) => {
      logger.warn({ err }, 'power graph cache lost its listening connection; dropping the cache');
      graphs.clear();
      client.release(err);
      listener = null;
      listening = null;
    });
    await client.query(`LISTEN ${boardChangedChannel}`);
    listener = client;
  }

  return {
    async get(boardId: number): Promise<PowerGraph> {
      if (closed) throw new Error('the power graph cache is closed');
      listening ??= listen().catch((err) => {
        listening = null;
        throw err;
      });
      await listening;
      let graph = graphs.get(boardId);
      if (!graph) {
        graph = repo.loadGraphInput(boardId).then(createPowerGraph);
        graphs.set(boardId, graph);
        graph.catch(() => graphs.delete(boardId));
      }
      return graph;
    },

    /** For the process that made the change: drop at once instead of waiting for the notification. */
    drop(boardId: number) {
      graphs.delete(boardId);
    },

    async close() {
      closed = true;
      graphs.clear();
      if (listener) {
        const client = listener;
        listener = null;
        await client.query(`UNLISTEN ${boardChangedChannel}`).catch(() => {});
        client.release();
      }
    },
  };
}

export type PowerGraphCache = ReturnType<typeof createPowerGraphCache>;
