// Bulk writes through COPY ... FROM STDIN (text format): several times faster than batched INSERTs
// for the tens of thousands of pin rows a laptop board has.
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { PoolClient } from 'pg';
import { from as copyFrom } from 'pg-copy-streams';

type Cell = string | number | boolean | null | undefined;

// PostgreSQL COPY text format: backslash escapes, \N for NULL.
function encodeCell(value: Cell): string {
  if (value === null || value === undefined) return '\\N';
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) return '\\N';
    return String(value);
  }
  if (typeof value === 'boolean') return value ? 't' : 'f';
  return value.replace(/[\\\t\n\r]/g, (c) => ({ '\\': '\\\\', '\t': '\\t', '\n': '\\n', '\r': '\\r' })[c]!);
}

export async function copyRows(
  client: PoolClient,
  table: string,
  columns: readonly string[],
  rows: Iterable<readonly Cell[]>,
  onChunk?: (rowsWritten: number) => void,
): Promise<number> {
  let count = 0;
  function* lines() {
    let chunk: string[] = [];
    for (const row of rows) {
      chunk.push(row.map(encodeCell).join('\t'));
      count++;
      if (chunk.length === 5000) {
        yield chunk.join('\n') + '\n';
        chunk = [];
        onChunk?.(count);
      }
    }
    if (chunk.length) yield chunk.join('\n') + '\n';
  }
  const stream = client.query(copyFrom(`COPY ${table} (${columns.join(', ')}) FROM STDIN`));
  await pipeline(Readable.from(lines()), stream);
  onChunk?.(count);
  return count;
}

/** Reserves `count` ids from a table's identity sequence so rows can reference each other before COPY. */
export async function reserveIds(client: PoolClient, table: string, count: number): Promise<number[]> {
  if (count === 0) return [];
  const result = await client.query<{ id: number }>(
    `SELECT nextval(pg_get_serial_sequence($1, 'id'))::int AS id FROM generate_series(1, $2)`,
    [table, count],
  );
  return result.rows.map((r) => r.id);
}
