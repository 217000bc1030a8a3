// Writes a checked board draft into PostgreSQL in one transaction: a new board, or a replaced netlist
// with previous annotations carried over. Bulk rows go through COPY.
import type { PoolClient } from 'pg';
import {
  carryOverAnnotations,
  inferComponentKind,
  normalizeNetName,
  type BoardDraft,
  type PreviousAnnotations,
} from '@railyard/board-analysis';
import type { BoardMeta, ImportSummary } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import { boardChangedChannel } from '../power-tree/power-graph-cache';
import { copyRows, reserveIds } from './copy-rows';

export interface StoreRequest {
  slug: string;
  meta: Partial<BoardMeta>;
  replace: boolean;
  draft: BoardDraft;
  rootFromFile: boolean;
  enteredBy: string;
  onProgress: (phase: string, progress: number) => void;
}

async function readPrevious(client: PoolClient, boardId: number): Promise<PreviousAnnotations> {
  const nets = await client.query<{
    name: string;
    nominal_voltage: number | null;
    description: string;
    aliases: string[];
  }>(
    `SELECT n.name, n.nominal_voltage, n.description,
            COALESCE(array_agg(a.alias ORDER BY a.alias) FILTER (WHERE a.alias IS NOT NULL), '{}') AS aliases
     FROM nets n LEFT JOIN net_aliases a ON a.net_id = n.id
     WHERE n.board_id = $1 GROUP BY n.id`,
    [boardId],
  );
  const links = await client.query<{ from: string; to: string; via: string; kind: 'converter' | 'switch' | 'series'; entered_by: string | null }>(
    `SELECT f.name AS from, t.name AS to, l.via_refdes AS via, l.kind, l.entered_by
     FROM power_links l JOIN nets f ON f.id = l.from_net_id JOIN nets t ON t.id = l.to_net_id
     WHERE l.board_id = $1 AND l.origin = 'entered' ORDER BY l.id`,
    [boardId],
  );
  const root = await client.query<{ name: string | null }>(
    `SELECT r.name FROM boards b LEFT JOIN nets r ON r.id = b.root_net_id
     WHERE b.id = $1 AND b.root_net_entered`,
    [boardId],
  );
  return {
    nets: nets.rows.map((r) => ({
      name: r.name,
      nominalVoltage: r.nominal_voltage,
      description: r.description,
      aliases: r.aliases,
    })),
    enteredLinks: links.rows.map((r) => ({ from: r.from, to: r.to, via: r.via, kind: r.kind, enteredBy: r.entered_by })),
    enteredRoot: root.rows[0]?.name ?? null,
  };
}

export async function storeBoardDraft(client: PoolClient, request: StoreRequest): Promise<ImportSummary & { boardId: number; warnings: BoardDraft['warnings'] }> {
  const { slug, meta, replace, onProgress } = request;
  let draft = request.draft;
  let dropped: string[] = [];
  let enteredByLink = new Map<object, string | null>();
  let rootEntered = request.rootFromFile;
  let previousCaseLinks: {
    nets: { case_id: number; name: string }[];
    parts: { case_id: number; refdes: string; culprit: boolean }[];
  } = { nets: [], parts: [] };

  // Two imports of the same slug must not interleave.
  await client.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`board:${slug}`]);
  const existing = await client.query<{ id: number }>('SELECT id FROM boards WHERE slug = $1', [slug]);
  let boardId = existing.rows[0]?.id;

  if (boardId !== undefined) {
    if (!replace) {
      throw AppError.conflict(`Board "${slug}" already has a netlist; import with replace to replace it`);
    }
    onProgress('reading previous annotations', 0.12);
    const previous = await readPrevious(client, boardId);
    const carried = carryOverAnnotations(draft, previous, request.rootFromFile);
    draft = carried.draft;
    dropped = carried.dropped;
    enteredByLink = carried.enteredBy;
    rootEntered = request.rootFromFile || (previous.enteredRoot !== null && draft.rootNet === previous.enteredRoot);
    // Case write-ups link to nets and parts by id; keep their names to link them again below.
    const caseNets = await client.query<{ case_id: number; name: string }>(
      `SELECT cn.case_id, n.name FROM case_nets cn JOIN nets n ON n.id = cn.net_id WHERE n.board_id = $1`,
      [boardId],
    );
    const caseParts = await client.query<{ case_id: number; refdes: string; culprit: boolean }>(
      `SELECT cc.case_id, c.refdes, cc.culprit FROM case_components cc JOIN components c ON c.id = cc.component_id
       WHERE c.board_id = $1`,
      [boardId],
    );
    previousCaseLinks = { nets: caseNets.rows, parts: caseParts.rows };
    onProgress('removing the previous netlist', 0.15);
    await client.query('UPDATE boards SET root_net_id = NULL WHERE id = $1', [boardId]);
    await client.query('DELETE FROM power_links WHERE board_id = $1', [boardId]);
    await client.query('DELETE FROM pins WHERE board_id = $1', [boardId]);
    await client.query('DELETE FROM components WHERE board_id = $1', [boardId]);
    await client.query('DELETE FROM net_aliases WHERE board_id = $1', [boardId]);
    await client.query('DELETE FROM nets WHERE board_id = $1', [boardId]);
    const fields = Object.entries({
      title: meta.title,
      device_family: meta.deviceFamily,
      board_number: meta.boardNumber,
      revision: meta.revision,
      battery_voltage: meta.batteryVoltage,
      notes: meta.notes,
    }).filter(([, v]) => v !== undefined);
    if (fields.length > 0) {
      await client.query(
        `UPDATE boards SET ${fields.map(([k], i) => `${k} = $${i + 2}`).join(', ')}, updated_at = now() WHERE id = $1`,
        [boardId, ...fields.map(([, v]) => v)],
      );
    }
  } else {
    const inserted = await client.query<{ id: number }>(
      `INSERT INTO boards (slug, title, device_family, board_number, revision, battery_voltage, notes)
       VALUES ($1, $2, $3, $4, $5, $6, $7) RETURNING id`,
      [
        slug,
        meta.title ?? slug,
        meta.deviceFamily ?? '',
        meta.boardNumber ?? '',
        meta.revision ?? '',
        meta.batteryVoltage ?? null,
        meta.notes ?? '',
      ],
    );
    boardId = inserted.rows[0]!.id;
  }
  const board = boardId;

  onProgress('writing nets', 0.2);
  const netIds = await reserveIds(client, 'nets', draft.nets.length);
  const netId = new Map(draft.nets.map((n, i) => [n.name, netIds[i]!]));
  await copyRows(
    client,
    'nets',
    ['id', 'board_id', 'name', 'normalized_name', 'kind', 'nominal_voltage', 'description'],
    draft.nets.map((n, i) => [netIds[i], board, n.name, n.normalizedName, n.kind, n.nominalVoltage, n.description]),
  );
  await copyRows(
    client,
    'net_aliases',
    ['board_id', 'net_id', 'alias', 'normalized_alias'],
    draft.nets.flatMap((n) => n.aliases.map((a) => [board, netId.get(n.name), a, normalizeNetName(a)])),
  );

  onProgress('writing components', 0.3);
  const componentIds = await reserveIds(client, 'components', draft.components.length);
  const componentId = new Map(draft.components.map((c, i) => [c.refdes, componentIds[i]!]));
  await copyRows(
    client,
    'components',
    ['id', 'board_id', 'refdes', 'kind', 'kind_entered', 'value', 'magnitude', 'unit', 'tolerance', 'rated_voltage', 'package', 'side', 'x', 'y', 'rotation'],
    draft.components.map((c, i) => [
      componentIds[i], board, c.refdes, c.kind, c.kind !== inferComponentKind(c.refdes), c.value, c.magnitude, c.unit, c.tolerance,
      c.ratedVoltage, c.package, c.side, c.x, c.y, c.rotation,
    ]),
  );

  const totalPins = draft.components.reduce((sum, c) => sum + c.pins.length, 0);
  onProgress('writing pins', 0.4);
  function* pinRows() {
    for (const c of draft.components) {
      const cid = componentId.get(c.refdes);
      for (const p of c.pins) {
        yield [board, cid, p.pin, p.net === null ? null : netId.get(p.net), p.x, p.y] as const;
      }
    }
  }
  const pinCount = await copyRows(client, 'pins', ['board_id', 'component_id', 'pin', 'net_id', 'x', 'y'], pinRows(), (n) =>
    onProgress('writing pins', 0.4 + 0.5 * (totalPins === 0 ? 1 : n / totalPins)),
  );

  onProgress('writing power links', 0.92);
  await copyRows(
    client,
    'power_links',
    ['board_id', 'from_net_id', 'to_net_id', 'via_component_id', 'via_refdes', 'kind', 'origin', 'entered_by'],
    draft.powerLinks.map((l) => [
      board,
      netId.get(l.from),
      netId.get(l.to),
      componentId.get(l.via) ?? null,
      l.via,
      l.kind,
      l.origin,
      l.origin === 'entered' ? (enteredByLink.has(l) ? enteredByLink.get(l)! : request.enteredBy) : null,
    ]),
  );

  await client.query('UPDATE boards SET root_net_id = $2, root_net_entered = $3, updated_at = now() WHERE id = $1', [
    board,
    draft.rootNet === null ? null : (netId.get(draft.rootNet) ?? null),
    rootEntered && draft.rootNet !== null,
  ]);
  // Case links follow their nets and parts by name; a link whose net or part is gone is reported.
  for (const link of previousCaseLinks.nets) {
    const id = netId.get(link.name);
    if (id === undefined) dropped.push(`link of case ${link.case_id} to net ${link.name}: the net is not in the new netlist`);
    else await client.query('INSERT INTO case_nets (case_id, net_id) VALUES ($1, $2) ON CONFLICT DO NOTHING', [link.case_id, id]);
  }
  for (const link of previousCaseLinks.parts) {
    const id = componentId.get(link.refdes);
    if (id === undefined) dropped.push(`link of case ${link.case_id} to part ${link.refdes}: the part is not in the new netlist`);
    else
      await client.query(
        'INSERT INTO case_components (case_id, component_id, culprit) VALUES ($1, $2, $3) ON CONFLICT DO NOTHING',
        [link.case_id, id, link.culprit],
      );
  }

  // delivered at commit: every API process drops its cached power graph of this board
  await client.query(`SELECT pg_notify('${boardChangedChannel}', $1::text)`, [String(board)]);
  onProgress('finishing', 0.97);

  return {
    boardId: board,
    nets: draft.nets.length,
    components: draft.components.length,
    pins: pinCount,
    powerLinks: draft.powerLinks.length,
    groundNets: draft.groundNets,
    rootNet: draft.rootNet,
    replaced: existing.rows.length > 0,
    dropped,
    warnings: draft.warnings,
  };
}

