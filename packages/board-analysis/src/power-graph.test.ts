import type { ComponentKind, NetKind, PowerLinkKind } from '@railyard/shared';
import { MultiDirectedGraph, MultiUndirectedGraph } from 'graphology';
import { connectedComponents } from 'graphology-components';
import { bidirectional, singleSourceLength } from 'graphology-shortest-path';
import { bfsFromNode } from 'graphology-traversal';
import { describe, expect, it } from 'vitest';
import { createPowerGraph, type PowerGraphInput } from './power-graph';
import { parseComponentValue } from './value-code';

type Net = PowerGraphInput['nets'][number];
type Link = PowerGraphInput['links'][number];
type Part = PowerGraphInput['parts'][number];

function net(name: string, kind: NetKind = 'power', nominalVoltage: number | null = null): Net {
  return { name, kind, nominalVoltage };
}

function link(from: string, to: string, via: string, kind: PowerLinkKind): Link {
  return { from, to, via, kind, origin: kind === 'series' ? 'derived' : 'entered' };
}

function part(refdes: string, kind: ComponentKind, value: string, nets: (string | null)[]): Part {
  const parsed = parseComponentValue(value, kind);
  return {
    refdes,
    kind,
    value,
    magnitude: parsed.magnitude,
    unit: parsed.unit,
    package: '',
    side: null,
    pins: nets.map((name, i) => ({ pin: String(i + 1), net: name })),
  };
}

// An invented notebook-style power tree: the adapter input (the board root) through a ferrite and
// a MOSFET to VSYS, the battery through a second MOSFET to VSYS, a buck whose inductor carries the
// 3.3 V rail, a ferrite-fed audio rail, a load-switched rail and an LDO. Apart from it: an
// isolated supply (a second source), a loop of links no source reaches and a rail with no links.
function notebookBoard(rootNet: string | null = 'DC_IN'): PowerGraphInput {
  return {
    nets: [
      net('DC_IN', 'power', 19),
      net('DC_IN_FLT', 'power', 19),
      net('VBAT', 'power', 11.4),
      net('VSYS'),
      net('VCC_5V', 'power', 5),
      net('LX_3V3'),
      net('VCC_3V3', 'power', 3.3),
      net('VCC_3V3_AUD', 'power', 3.3),
      net('VCC_3V3_SW', 'power', 3.3),
      net('VCC_1V8', 'power', 1.8),
      net('ISO_IN'),
      net('ISO_OUT'),
      net('LOOP_A'),
      net('LOOP_B'),
      net('SPARE_RAIL'),
      net('GND', 'ground', 0),
      net('ADP_EN', 'signal'),
      net('SW_EN', 'signal'),
    ],
    links: [
      link('DC_IN', 'DC_IN_FLT', 'FB2', 'series'),
      link('DC_IN_FLT', 'VSYS', 'Q1', 'switch'),
      link('VBAT', 'VSYS', 'Q2', 'switch'),
      link('VSYS', 'VCC_5V', 'U1', 'converter'),
      link('VSYS', 'LX_3V3', 'U2', 'converter'),
      link('LX_3V3', 'VCC_3V3', 'L2', 'series'),
      link('VCC_3V3', 'VCC_3V3_AUD', 'FB1', 'series'),
      link('VCC_3V3', 'VCC_3V3_SW', 'U3', 'switch'),
      link('VCC_3V3', 'VCC_1V8', 'U4', 'converter'),
      link('ISO_IN', 'ISO_OUT', 'U9', 'converter'),
      link('LOOP_A', 'LOOP_B', 'U10', 'converter'),
      link('LOOP_B', 'LOOP_A', 'U11', 'converter'),
    ],
    parts: [
      part('FB2', 'ferrite', '120R', ['DC_IN', 'DC_IN_FLT']),
      part('Q1', 'mosfet', '', ['DC_IN_FLT', 'VSYS', 'ADP_EN']),
      part('Q2', 'mosfet', '', ['VBAT', 'VSYS', 'ADP_EN']),
      part('U1', 'ic', '', ['VSYS', 'VCC_5V', 'GND']),
      part('U2', 'ic', '', ['VSYS', 'LX_3V3', 'GND']),
      part('L2', 'inductor', '2u2', ['LX_3V3', 'VCC_3V3']),
      part('FB1', 'ferrite', '600R', ['VCC_3V3', 'VCC_3V3_AUD']),
      part('U3', 'ic', '', ['VCC_3V3', 'VCC_3V3_SW', 'SW_EN', 'GND']),
      part('U4', 'ic', '', ['VCC_3V3', 'VCC_1V8', 'GND']),
      part('C1', 'capacitor', '22uF', ['VCC_3V3', 'GND']),
      // U9, U10 and U11 are not in the parts list
    ],
    rootNet,
  };
}

describe('power graph roots', () => {
  it('gives the board root first, then the other sources by name', () => {
    const graph = createPowerGraph(notebookBoard());

    // LOOP_A and LOOP_B feed each other, so neither is a source; SPARE_RAIL feeds nothing.
    expect(graph.roots()).toEqual(['DC_IN', 'ISO_IN', 'VBAT']);
  });

  it('gives the sources by name when the board has no root', () => {
    expect(createPowerGraph(notebookBoard(null)).roots()).toEqual(['DC_IN', 'ISO_IN', 'VBAT']);
  });

  it('puts the board root first even when links feed it', () => {
    expect(createPowerGraph(notebookBoard('VSYS')).roots()).toEqual([
      'VSYS',
      'DC_IN',
      'ISO_IN',
      'VBAT',
    ]);
  });
});

describe('power graph trace', () => {
  it('traces what the root feeds, by depth then name', () => {
    const tree = createPowerGraph(notebookBoard()).trace('DC_IN', 'down', 32);

    expect(tree.nodes.map((n) => [n.net, n.depth])).toEqual([
      ['DC_IN', 0],
      ['DC_IN_FLT', 1],
      ['VSYS', 2],
      ['LX_3V3', 3],
      ['VCC_5V', 3],
      ['VCC_3V3', 4],
      ['VCC_1V8', 5],
      ['VCC_3V3_AUD', 5],
      ['VCC_3V3_SW', 5],
    ]);
    expect(tree.edges.map((e) => [e.via, e.tree])).toEqual([
      ['FB2', true],
      ['Q1', true],
      ['U2', true],
      ['U1', true],
      ['L2', true],
      ['U4', true],
      ['FB1', true],
      ['U3', true],
    ]);
    expect(tree).toMatchObject({ start: 'DC_IN', direction: 'down', depth: 32 });
  });

  it('traces what feeds a rail against the links, keeping each link pointing the way power flows', () => {
    const tree = createPowerGraph(notebookBoard()).trace('VCC_3V3_AUD', 'up', 32);

    expect(tree.nodes.map((n) => [n.net, n.depth, n.childCount])).toEqual([
      ['VCC_3V3_AUD', 0, 1],
      ['VCC_3V3', 1, 1],
      ['LX_3V3', 2, 1],
      ['VSYS', 3, 2],
      ['DC_IN_FLT', 4, 1],
      ['VBAT', 4, 0],
      ['DC_IN', 5, 0],
    ]);
    const q2 = tree.edges.find((e) => e.via === 'Q2');
    expect(q2).toMatchObject({ from: 'VBAT', to: 'VSYS', kind: 'switch', tree: true });
  });

  it('carries each rail’s kind, voltage and load counts on its node', () => {
    const tree = createPowerGraph(notebookBoard()).trace('VCC_3V3', 'down', 1);
    const rail = tree.nodes[0];

    // U3, U4 and FB1 carry the rail on, L2 brings it in; C1 decouples it.
    expect(rail).toEqual({
      net: 'VCC_3V3',
      kind: 'power',
      nominalVoltage: 3.3,
      depth: 0,
      loadCount: 5,
      countsByRole: { shunt: 1, draw: 0, series: 4, other: 0 },
      childCount: 3,
      truncated: false,
    });
  });

  it('visits each net of a loop of links once and does not hang', () => {
    const graph = createPowerGraph({
      nets: [net('A'), net('B'), net('C')],
      links: [
        link('A', 'B', 'U1', 'converter'),
        link('B', 'C', 'U2', 'converter'),
        link('C', 'A', 'U3', 'converter'),
        link('B', 'A', 'Q1', 'switch'),
        link('A', 'A', 'R1', 'series'),
      ],
      parts: [],
      rootNet: 'A',
    });

    const down = graph.trace('A', 'down', 64);
    const up = graph.trace('A', 'up', 64);

    expect(down.nodes.map((n) => [n.net, n.depth])).toEqual([
      ['A', 0],
      ['B', 1],
      ['C', 2],
    ]);
    expect(up.nodes.map((n) => [n.net, n.depth])).toEqual([
      ['A', 0],
      ['B', 1],
      ['C', 1],
    ]);
    // every link between the three nets, each once; only the first way to a net is a tree edge
    expect(down.edges.map((e) => [e.via, e.tree])).toEqual([
      ['R1', false],
      ['U1', true],
      ['Q1', false],
      ['U2', true],
      ['U3', false],
    ]);
  });

  it('does not reach rails that nothing upstream connects to', () => {
    const tree = createPowerGraph(notebookBoard()).trace('DC_IN', 'down', 32);
    const reached = tree.nodes.map((n) => n.net);

    expect(reached).not.toContain('ISO_OUT');
    expect(reached).not.toContain('LOOP_A');
    expect(reached).not.toContain('SPARE_RAIL');
    expect(tree.edges.map((e) => e.via)).not.toContain('Q2');
  });

  it('gives a rail without links as a tree of one node', () => {
    const tree = createPowerGraph(notebookBoard()).trace('SPARE_RAIL', 'down', 32);

    expect(tree.nodes).toHaveLength(1);
    expect(tree.nodes[0]).toMatchObject({ net: 'SPARE_RAIL', childCount: 0, truncated: false });
    expect(tree.edges).toEqual([]);
  });

  it('stops at the depth limit and marks the nodes whose children were cut off', () => {
    const tree = createPowerGraph(notebookBoard()).trace('DC_IN', 'down', 2);

    expect(tree.nodes.map((n) => [n.net, n.depth, n.childCount, n.truncated])).toEqual([
      ['DC_IN', 0, 1, false],
      ['DC_IN_FLT', 1, 1, false],
      ['VSYS', 2, 2, true],
    ]);
    expect(tree.edges.map((e) => e.via)).toEqual(['FB2', 'Q1']);
  });

  it('gives only the start, truncated, at depth 0', () => {
    const tree = createPowerGraph(notebookBoard()).trace('VSYS', 'down', 0);

    expect(tree.nodes.map((n) => [n.net, n.truncated])).toEqual([['VSYS', true]]);
    expect(tree.edges).toEqual([]);
  });

  it('does not mark a node at the depth limit as truncated when its children are already in the tree', () => {
    const graph = createPowerGraph({
      nets: [net('A'), net('B'), net('C')],
      links: [
        link('A', 'B', 'U1', 'converter'),
        link('B', 'C', 'U2', 'converter'),
        link('C', 'A', 'U3', 'switch'),
      ],
      parts: [],
      rootNet: 'A',
    });

    const tree = graph.trace('A', 'down', 2);

    expect(tree.nodes.find((n) => n.net === 'C')).toMatchObject({ depth: 2, truncated: false });
    expect(tree.edges.find((e) => e.via === 'U3')).toMatchObject({
      from: 'C',
      to: 'A',
      tree: false,
    });
  });

  it('rejects a depth that is not a whole number of hops', () => {
    const graph = createPowerGraph(notebookBoard());

    expect(() => graph.trace('DC_IN', 'down', -1)).toThrow('trace depth must be a whole number');
    expect(() => graph.trace('DC_IN', 'down', 1.5)).toThrow('got 1.5');
  });
});

describe('power graph coupled groups', () => {
  it('puts a rail fed through a ferrite in the root rail’s coupled group', () => {
    const group = createPowerGraph(notebookBoard()).coupledGroup('DC_IN');

    expect(group.nets.map((n) => n.name)).toEqual(['DC_IN', 'DC_IN_FLT']);
    expect(group.links.map((l) => l.via)).toEqual(['FB2']);
  });

  it('joins the inductor-fed output and a ferrite-fed rail into one group, whichever member is asked', () => {
    const graph = createPowerGraph(notebookBoard());
    const fromRail = graph.coupledGroup('VCC_3V3');
    const fromBranch = graph.coupledGroup('VCC_3V3_AUD');

    expect(fromRail.nets).toEqual([
      { name: 'LX_3V3', kind: 'power', nominalVoltage: null },
      { name: 'VCC_3V3', kind: 'power', nominalVoltage: 3.3 },
      { name: 'VCC_3V3_AUD', kind: 'power', nominalVoltage: 3.3 },
    ]);
    expect(fromRail.links.map((l) => l.via)).toEqual(['L2', 'FB1']);
    expect(fromBranch).toEqual(fromRail);
  });

  it('keeps a rail behind a load switch out of the group, and one behind a converter too', () => {
    const names = createPowerGraph(notebookBoard())
      .coupledGroup('VCC_3V3')
      .nets.map((n) => n.name);

    expect(names).not.toContain('VCC_3V3_SW');
    expect(names).not.toContain('VCC_1V8');
    expect(names).not.toContain('VSYS');
  });

  it('gives a rail without series links a group of its own', () => {
    const group = createPowerGraph(notebookBoard()).coupledGroup('VSYS');

    expect(group.nets.map((n) => n.name)).toEqual(['VSYS']);
    expect(group.links).toEqual([]);
  });
});

describe('power graph links', () => {
  it('gives a MOSFET between two rails as a switch link on both rails, with the part’s kind', () => {
    const graph = createPowerGraph(notebookBoard());
    const q1 = {
      from: 'DC_IN_FLT',
      to: 'VSYS',
      via: 'Q1',
      viaKind: 'mosfet',
      kind: 'switch',
      origin: 'entered',
    };

    expect(graph.linksOut('DC_IN_FLT')).toEqual([q1]);
    expect(graph.linksIn('VSYS')).toEqual([
      q1,
      { from: 'VBAT', to: 'VSYS', via: 'Q2', viaKind: 'mosfet', kind: 'switch', origin: 'entered' },
    ]);
    expect(
      graph
        .loads('VSYS')
        .parts.filter((p) => p.role === 'series')
        .map((p) => p.refdes),
    ).toEqual(['Q1', 'Q2', 'U1', 'U2']);
    expect(graph.coupledGroup('VSYS').nets.map((n) => n.name)).not.toContain('DC_IN_FLT');
  });

  it('gives links leaving a rail by destination', () => {
    const graph = createPowerGraph(notebookBoard());

    expect(graph.linksOut('VCC_3V3').map((l) => l.to)).toEqual([
      'VCC_1V8',
      'VCC_3V3_AUD',
      'VCC_3V3_SW',
    ]);
  });

  it('gives a null part kind for a link whose part is not on the board', () => {
    expect(createPowerGraph(notebookBoard()).linksOut('ISO_IN')[0]?.viaKind).toBeNull();
  });

  it('hands out copies, so a caller changing an answer does not change the graph', () => {
    const graph = createPowerGraph(notebookBoard());
    const first = graph.linksOut('VSYS');
    first[0]!.to = 'CHANGED';
    graph.coupledGroup('VCC_3V3').nets.pop();
    graph.trace('VCC_3V3', 'down', 1).nodes[0]!.countsByRole.shunt = 99;

    expect(graph.linksOut('VSYS')[0]?.to).toBe('LX_3V3');
    expect(graph.coupledGroup('VCC_3V3').nets).toHaveLength(3);
    expect(graph.trace('VCC_3V3', 'down', 1).nodes[0]?.countsByRole.shunt).toBe(1);
  });
});

describe('power graph upstream paths', () => {
  it('gives the way from the root down to a rail, root first', () => {
    const paths = createPowerGraph(notebookBoard()).upstreamPaths('VCC_3V3_AUD');

    expect(paths).toEqual([
      [
        { net: 'DC_IN', via: null, kind: null },
        { net: 'DC_IN_FLT', via: 'FB2', kind: 'series' },
        { net: 'VSYS', via: 'Q1', kind: 'switch' },
        { net: 'LX_3V3', via: 'U2', kind: 'converter' },
        { net: 'VCC_3V3', via: 'L2', kind: 'series' },
        { net: 'VCC_3V3_AUD', via: 'FB1', kind: 'series' },
      ],
    ]);
  });

  it('gives the root itself as a way of one step', () => {
    expect(createPowerGraph(notebookBoard()).upstreamPaths('DC_IN')).toEqual([
      [{ net: 'DC_IN', via: null, kind: null }],
    ]);
  });

  it('gives only ways from the board root when the board root reaches the rail', () => {
    const paths = createPowerGraph(notebookBoard()).upstreamPaths('VSYS');

    expect(paths.map((p) => p[0]?.net)).toEqual(['DC_IN']);
  });

  it('gives ways from every source when the board has no root', () => {
    const paths = createPowerGraph(notebookBoard(null)).upstreamPaths('VSYS');

    expect(paths.map((p) => p.map((step) => step.net))).toEqual([
      ['VBAT', 'VSYS'],
      ['DC_IN', 'DC_IN_FLT', 'VSYS'],
    ]);
  });

  it('falls back to another source when the board root does not reach the rail', () => {
    expect(createPowerGraph(notebookBoard()).upstreamPaths('ISO_OUT')).toEqual([
      [
        { net: 'ISO_IN', via: null, kind: null },
        { net: 'ISO_OUT', via: 'U9', kind: 'converter' },
      ],
    ]);
  });

  it('gives no way to a rail no source reaches', () => {
    const graph = createPowerGraph(notebookBoard());

    expect(graph.upstreamPaths('LOOP_A')).toEqual([]);
    expect(graph.upstreamPaths('SPARE_RAIL')).toEqual([]);
  });

  describe('with several shortest ways', () => {
    // R feeds A twice in parallel (U1, U2); R→A→T and R→B→T are the shortest ways to T, R→C→D→T
    // is longer.
    const diamond = createPowerGraph({
      nets: ['R', 'A', 'B', 'C', 'D', 'T'].map((name) => net(name)),
      links: [
        link('R', 'A', 'U2', 'converter'),
        link('R', 'A', 'U1', 'converter'),
        link('R', 'B', 'U3', 'converter'),
        link('A', 'T', 'U4', 'switch'),
        link('B', 'T', 'U5', 'switch'),
        link('R', 'C', 'U6', 'converter'),
        link('C', 'D', 'U7', 'converter'),
        link('D', 'T', 'U8', 'converter'),
      ],
      parts: [],
      rootNet: 'R',
    });

    it('gives each distinct shortest way once, parallel parts standing for one way', () => {
      const paths = diamond.upstreamPaths('T', 5);

      expect(paths.map((p) => p.map((step) => step.via ?? step.net))).toEqual([
        ['R', 'U1', 'U4'],
        ['R', 'U3', 'U5'],
      ]);
    });

    it('gives no more ways than the limit', () => {
      expect(diamond.upstreamPaths('T', 1)).toHaveLength(1);
      expect(diamond.upstreamPaths('T', 0)).toEqual([]);
    });
  });

  it('takes ways from each source in turn, so a second source is not crowded out', () => {
    // no board root; X reaches T two ways, Y one way
    const graph = createPowerGraph({
      nets: ['X', 'Y', 'P1', 'P2', 'P3', 'T'].map((name) => net(name)),
      links: [
        link('X', 'P1', 'U1', 'converter'),
        link('X', 'P2', 'U2', 'converter'),
        link('Y', 'P3', 'U3', 'converter'),
        link('P1', 'T', 'Q1', 'switch'),
        link('P2', 'T', 'Q2', 'switch'),
        link('P3', 'T', 'Q3', 'switch'),
      ],
      parts: [],
      rootNet: null,
    });

    expect(graph.upstreamPaths('T', 2).map((p) => p.map((s) => s.net))).toEqual([
      ['X', 'P1', 'T'],
      ['Y', 'P3', 'T'],
    ]);
    expect(graph.upstreamPaths('T', 3)).toHaveLength(3);
  });
});

describe('power graph input checks', () => {
  it('answers whether a net is on the board', () => {
    const graph = createPowerGraph(notebookBoard());

    expect(graph.hasNet('VSYS')).toBe(true);
    expect(graph.hasNet('vsys')).toBe(false);
  });

  it('rejects questions about a net that is not on the board, naming it', () => {
    const graph = createPowerGraph(notebookBoard());

    expect(() => graph.trace('NOPE', 'down', 3)).toThrow('unknown net "NOPE"');
    expect(() => graph.loads('NOPE')).toThrow('unknown net "NOPE"');
    expect(() => graph.coupledGroup('NOPE')).toThrow('unknown net "NOPE"');
    expect(() => graph.upstreamPaths('NOPE')).toThrow('unknown net "NOPE"');
    expect(() => graph.linksIn('NOPE')).toThrow('unknown net "NOPE"');
  });

  it('rejects a link to a net that is not on the board, naming the link', () => {
    const board = notebookBoard();
    board.links.push(link('VSYS', 'VCC_12V', 'U12', 'converter'));

    expect(() => createPowerGraph(board)).toThrow(
      'power link 13 (U12: VSYS → VCC_12V): unknown net "VCC_12V" in to',
    );
  });

  it('rejects a pin on a net that is not on the board, naming the part and pin', () => {
    const board = notebookBoard();
    board.parts.push(part('C7', 'capacitor', '1uF', ['VCC_1V8', 'GND_X']));

    expect(() => createPowerGraph(board)).toThrow('part "C7" pin "2": unknown net "GND_X"');
  });

  it('rejects a net listed twice, a part listed twice and a root that is not a net', () => {
    const twiceNet = notebookBoard();
    twiceNet.nets.push(net('VSYS'));
    const twicePart = notebookBoard();
    twicePart.parts.push(part('C1', 'capacitor', '1uF', ['VSYS', 'GND']));

    expect(() => createPowerGraph(twiceNet)).toThrow('net "VSYS" is listed twice');
    expect(() => createPowerGraph(twicePart)).toThrow('part "C1" is listed twice');
    expect(() => createPowerGraph(notebookBoard('VIN'))).toThrow(
      'root net "VIN" is not a net of this board',
    );
  });
});

// Cross-check against graphology, a general-purpose graph library independent of this code:
// the same random boards, asked the same questions, must give the same answers.

/** mulberry32, a small seeded PRNG (public domain), so every run checks the same boards. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const linkKinds: PowerLinkKind[] = ['converter', 'switch', 'series'];

function randomBoard(random: () => number): PowerGraphInput {
  const netCount = 5 + Math.floor(random() * 56);
  // names in random order, so name order and creation order differ
  const nets = Array.from({ length: netCount }, (_, i) =>
    net(`N${Math.floor(random() * 1000)}_${i}`),
  );
  const pick = () => nets[Math.floor(random() * netCount)]!.name;
  const linkCount = Math.floor(random() * netCount * 2);
  const links = Array.from({ length: linkCount }, (_, i) =>
    link(pick(), pick(), `U${i}`, linkKinds[Math.floor(random() * 3)]!),
  );
  return { nets, links, parts: [], rootNet: random() < 0.75 ? pick() : null };
}

function graphologyBoard(board: PowerGraphInput) {
  const down = new MultiDirectedGraph();
  const up = new MultiDirectedGraph();
  const series = new MultiUndirectedGraph();
  for (const { name } of board.nets) {
    down.addNode(name);
    up.addNode(name);
    series.addNode(name);
  }
  for (const l of board.links) {
    down.addEdge(l.from, l.to, { via: l.via, kind: l.kind });
    up.addEdge(l.to, l.from, { via: l.via, kind: l.kind });
    if (l.kind === 'series') series.addEdge(l.from, l.to);
  }
  return { down, up, series };
}

/** graphology-traversal's BFS, not going past `maxDepth` hops: net → first-reach depth. */
function graphologyBfs(graph: MultiDirectedGraph, start: string, maxDepth: number) {
  const reached = new Map<string, number>();
  bfsFromNode(graph, start, (node, _attributes, depth) => {
    reached.set(node, depth);
    return depth >= maxDepth;
  });
  return reached;
}

/**
 * Distinct shortest net sequences from a source to `target`, counted over graphology's
 * distances from that source.
 */
function countShortestWays(
  graph: MultiDirectedGraph,
  distance: Record<string, number>,
  source: string,
  target: string,
): number {
  if (distance[target] === undefined) return 0;
  const ways = new Map<string, number>([[source, 1]]);
  const byDistance = Object.keys(distance).sort((a, b) => distance[a]! - distance[b]!);
  for (const node of byDistance) {
    if (node === source) continue;
    let sum = 0;
    for (const from of graph.inNeighbors(node)) {
      if (distance[from] === distance[node]! - 1) sum += ways.get(from) ?? 0;
    }
    ways.set(node, sum);
  }
  return ways.get(target) ?? 0;
}

const sorted = <T>(values: Iterable<T>) => [...values].sort();
const byName = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

describe('power graph against graphology on 200 seeded random boards', () => {
  const boardRandom = mulberry32(0x5eed);
  const boards = Array.from({ length: 200 }, () => randomBoard(boardRandom));
  /** a handful of nets of each board, so the whole check stays quick */
  const startsOf = (board: PowerGraphInput, random: () => number) =>
    Array.from({ length: 8 }, () => board.nets[Math.floor(random() * board.nets.length)]!.name);

  it('reaches the same nets at the same depths as graphology-traversal bfsFromNode, down and up', () => {
    const random = mulberry32(1);
    for (const board of boards) {
      const graph = createPowerGraph(board);
      const reference = graphologyBoard(board);
      for (const start of startsOf(board, random)) {
        for (const maxDepth of [Math.floor(random() * 5), 64]) {
          for (const direction of ['down', 'up'] as const) {
            // 'up' is BFS on the reversed graph
            const g = direction === 'down' ? reference.down : reference.up;
            const reached = graphologyBfs(g, start, maxDepth);
            const tree = graph.trace(start, direction, maxDepth);

            const childOf = (e: { from: string; to: string }) =>
              direction === 'down' ? e.to : e.from;
            const parentOf = (e: { from: string; to: string }) =>
              direction === 'down' ? e.from : e.to;
            const treeEdges = tree.edges.filter((e) => e.tree);
            const actual = {
              nodes: tree.nodes.map((n) => [n.net, n.depth]),
              childCounts: tree.nodes.map((n) => n.childCount),
              truncated: tree.nodes.filter((n) => n.truncated).map((n) => n.net),
              edgeCount: tree.edges.length,
              treeChildren: sorted(treeEdges.map(childOf)),
              treeEdgesGoOneDeeper: treeEdges.every(
                (e) => reached.get(childOf(e)) === reached.get(parentOf(e))! + 1,
              ),
            };
            const nodes = [...reached].sort(([a, da], [b, db]) => da - db || byName(a, b));
            const expected = {
              // each net once, by depth then name
              nodes,
              // graphology's out-degree on the graph traced
              childCounts: nodes.map(([net]) => g.outDegree(net)),
              truncated: nodes
                .filter(([net]) => g.outNeighbors(net).some((child) => !reached.has(child)))
                .map(([net]) => net),
              edgeCount: board.links.filter((l) => reached.has(l.from) && reached.has(l.to)).length,
              treeChildren: sorted(nodes.map(([net]) => net).filter((net) => net !== start)),
              treeEdgesGoOneDeeper: true,
            };
            expect(actual, `${direction} from ${start}, depth ${maxDepth}`).toEqual(expected);
          }
        }
      }
    }
  });

  it('gives the coupled group graphology-components finds as the connected component of the series-only graph', () => {
    for (const board of boards) {
      const graph = createPowerGraph(board);
      const { series } = graphologyBoard(board);
      for (const component of connectedComponents(series)) {
        const members = new Set(component);
        const seriesInside = board.links.filter((l) => l.kind === 'series' && members.has(l.from));
        const expected = { nets: sorted(component), links: sorted(seriesInside.map((l) => l.via)) };
        for (const name of component) {
          const group = graph.coupledGroup(name);
          const actual = {
            nets: sorted(group.nets.map((n) => n.name)),
            links: sorted(group.links.map((l) => l.via)),
          };
          expect(actual, `group of ${name}`).toEqual(expected);
        }
      }
    }
  });

  it('gives upstream paths as long as graphology-shortest-path finds, from the sources graphology identifies', () => {
    const random = mulberry32(2);
    let checkedPaths = 0;
    for (const board of boards) {
      const graph = createPowerGraph(board);
      const { down } = graphologyBoard(board);
      const sources = down.filterNodes(
        (node) => down.inDegree(node) === 0 && down.outDegree(node) > 0,
      );
      const otherSources = sorted(sources.filter((node) => node !== board.rootNet));
      expect(graph.roots()).toEqual(
        board.rootNet === null ? otherSources : [board.rootNet, ...otherSources],
      );

      // graphology-shortest-path, unweighted single-source lengths from each candidate root
      const distanceFrom = new Map(
        [...sources, ...(board.rootNet === null ? [] : [board.rootNet])].map((source) => [
          source,
          singleSourceLength(down, source),
        ]),
      );
      for (const { name } of board.nets) {
        const limit = 1 + Math.floor(random() * 4);
        const paths = graph.upstreamPaths(name, limit);
        const reaches = (source: string) => distanceFrom.get(source)![name] !== undefined;
        const feeding =
          board.rootNet !== null && reaches(board.rootNet)
            ? [board.rootNet]
            : otherSources.filter(reaches);
        const total = feeding.reduce(
          (sum, source) => sum + countShortestWays(down, distanceFrom.get(source)!, source, name),
          0,
        );

        const actual = {
          count: paths.length,
          roots: new Set(paths.map((p) => p[0]?.net)).size,
          distinct: new Set(paths.map((p) => p.map((s) => s.net).join(' '))).size,
          ways: paths.map((path) => ({
            fromFeedingRoot: feeding.includes(path[0]!.net),
            endsAtRail: path.at(-1)?.net === name,
            length: path.length,
            stepsAreLinks: path.slice(1).every((step, i) =>
              down.edges(path[i]!.net, step.net).some((e) => {
                const attributes = down.getEdgeAttributes(e);
                return attributes.via === step.via && attributes.kind === step.kind;
              }),
            ),
          })),
        };
        const expected = {
          count: Math.min(limit, total),
          roots: Math.min(limit, feeding.length),
          distinct: paths.length,
          ways: paths.map((path) => ({
            fromFeedingRoot: true,
            endsAtRail: true,
            // graphology-shortest-path, unweighted bidirectional search: nets on a shortest path
            length: bidirectional(down, path[0]!.net, name)?.length,
            stepsAreLinks: true,
          })),
        };
        expect(actual, `ways to ${name} (limit ${limit})`).toEqual(expected);
        checkedPaths += paths.length;
      }
    }
    // the random boards must exercise real paths, not only unreachable nets
    expect(checkedPaths).toBeGreaterThan(1000);
  });
});
