// One power graph per board, built on first use and kept in the API process. Any write to a board's
// netlist or links sends NOTIFY railyard_board_changed (inside its transaction, so it arrives at commit),
// and every process listening drops that board's graph. If the listening connection is lost, the whole
// cache is dropped and listening starts again, so a missed notification cannot leave a stale graph.
//
// Alongside each graph sit the board's root net as read with it, and the JSON of recent traces: a
// technician's page asks for the same trace again and again, and serialising it costs more than
// tracing. Both live and die with the graph they came from. Which id a slug names is kept too, and
// forgotten on the same notifications: a board's slug does not change, and whatever would delete a
// board must notify like any other write to it.
import { gzipSync } from 'node:zlib';
import etag from 'etag';
import type pg from 'pg';
import { createPowerGraph, type PowerGraph } from '@railyard/board-analysis';
import type { Logger } from '../../lib/logger';
import type { PowerTreeRepository } from './power-tree.repository';

export const boardChangedChannel = 'railyard_board_changed';

// Per board: a page asks for the root trace and a few rails either way; older ones give way.
const tracesKeptPerBoard = 32;

export interface CachedBoard {
  id: number;
  graph: PowerGraph;
  rootNet: string | null;
  /** The JSON text of `key`'s trace, made by `serialise` the first time and kept while the graph is. */
  traceJson(key: string, serialise: () => string): TraceJson;
}

/**
 * A trace as sent: the JSON as UTF-8 bytes and its entity tag, encoded and hashed once instead of on
 * every response.
 */
export interface TraceJson {
  bytes: Buffer;
  /** the same bytes gzipped (RFC 1952), for clients that accept it */
  gzipped: Buffer;
  etag: string;
}


function cachedBoard(id: number, graph: PowerGraph, rootNet: string | null): CachedBoard {
  const traces = new Map<string, TraceJson>();
  return {
    id,
    graph,
    rootNet,
    traceJson(key, serialise) {
      const held = traces.get(key);
      if (held !== undefined) return held;
      const text = serialise();
      const bytes = Buffer.from(text, 'utf8');
      // the package and the weak form Express itself uses for res.send
      const trace = { bytes, gzipped: gzipSync(bytes), etag: etag(bytes, { weak: true }) };
      if (traces.size >= tracesKeptPerBoard) traces.delete(traces.keys().next().value as string);
      traces.set(key, trace);
      return trace;
    },
  };
}

export function createPowerGraphCache(deps: { pool: pg.Pool; repo: PowerTreeRepository; logger: Logger }) {
  const { pool, repo, logger } = deps;
  const graphs = new Map<number, Promise<CachedBoard>>();
  const boardIds = new Map<string, number>();
  // Bumped whenever anything is forgotten: a slug looked up across a change is not remembered.
  let generation = 0;
  let listener: pg.PoolClient | null = null;
  let listening: Promise<void> | null = null;
  let closed = false;

  /** Drops one board (by id), or everything when null. */
  function forget(boardId: number | null) {
    generation += 1;
    if (boardId === null) {
      graphs.clear();
      boardIds.clear();
      return;
    }
    graphs.delete(boardId);
    for (const [slug, id] of boardIds) if (id === boardId) boardIds.delete(slug);
  }

  async function listen(): Promise<void> {
    const client = await pool.connect();
    client.on('notification', (message) => {
      const boardId = Number(message.payload);
      forget(Number.isInteger(boardId) ? boardId : null);
    });
    client.on('error', (err) => {
      logger.warn({ err }, 'power graph cache lost its listening connection; dropping the cache');
      forget(null);
      client.release(err);
      listener = null;
      listening = null;
    });
    await client.query(`LISTEN ${boardChangedChannel}`);
    listener = client;
  }

  /** Until LISTEN is in place a change could go unheard, so nothing is served from memory before. */
  async function whileListening(): Promise<void> {
    if (closed) throw new Error('the power graph cache is closed');
    listening ??= listen().catch((err) => {
      listening = null;
      throw err;
    });
    await listening;
  }

  async function board(boardId: number): Promise<CachedBoard> {
    await whileListening();
    let cached = graphs.get(boardId);
    if (!cached) {
      cached = repo
        .loadGraphInput(boardId)
        .then((input) => cachedBoard(boardId, createPowerGraph(input), input.rootNet));
      graphs.set(boardId, cached);
      cached.catch(() => graphs.delete(boardId));
    }
    return cached;
  }

  return {
    board,

    /** The board a slug names, or null when there is none. */
    async boardBySlug(slug: string): Promise<CachedBoard | null> {
      await whileListening();
      let boardId = boardIds.get(slug);
      if (boardId === undefined) {
        const seen = generation;
        const found = await repo.findBoardId(slug);
        if (found === null) return null;
        if (generation === seen) boardIds.set(slug, found);
        boardId = found;
      }
      return board(boardId);
    },

    async get(boardId: number): Promise<PowerGraph> {
      return (await board(boardId)).graph;
    },

    /** For the process that made the change: drop at once instead of waiting for the notification. */
    drop(boardId: number) {
      forget(boardId);
    },

    async close() {
      closed = true;
      forget(null);
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
