import type { PowerLinkKind, PowerTree, TreeNode } from '@railyard/shared';
import { DirectedGraph } from 'graphology';
import { bfsFromNode } from 'graphology-traversal';
import { describe, expect, it } from 'vitest';
import {
  buildTreeElements,
  graftTrace,
  highlightElements,
  initiallyCollapsed,
  linkElementId,
  loadSummaryLines,
  markerElementId,
  railElementId,
  shapeOfTrace,
  traceAncestors,
  treeHighlight,
  visibleRails,
} from './tree-elements';

function roles(counts: Partial<TreeNode['countsByRole']>): TreeNode['countsByRole'] {
  return { shunt: 0, draw: 0, series: 0, other: 0, ...counts };
}

function node(net: string, depth: number, extra: Partial<TreeNode> = {}): TreeNode {
  return {
    net,
    kind: 'power',
    nominalVoltage: null,
    depth,
    loadCount: 0,
    countsByRole: roles({}),
    childCount: 0,
    truncated: false,
    ...extra,
  };
}

type Link = [from: string, to: string, via: string, kind: PowerLinkKind, tree?: boolean];

function trace(
  start: string,
  nodes: TreeNode[],
  links: Link[],
  direction: 'down' | 'up' = 'down',
): PowerTree {
  return {
    board: 'test-board',
    start,
    direction,
    depth: 32,
    nodes,
    edges: links.map(([from, to, via, kind, tree = true]) => ({
      from,
      to,
      via,
      viaKind: null,
      kind,
      origin: 'derived',
      tree,
    })),
  };
}

// VBAT → VSYS → {VCC_3V3 → VCC_3V3_SENSOR, VCC_1V8 → VCC_1V8_AUDIO}; VCC_1V8 also fed from
// VCC_3V3 (a cross link, not the edge the trace first reached it by).
const small = trace(
  'VBAT',
  [
    node('VBAT', 0, { loadCount: 12, countsByRole: roles({ shunt: 10, draw: 2 }) }),
    node('VSYS', 1),
    node('VCC_3V3', 2, { nominalVoltage: 3.3, loadCount: 1, countsByRole: roles({ other: 1 }) }),
    node('VCC_1V8', 2),
    node('VCC_3V3_SENSOR', 3),
    node('VCC_1V8_AUDIO', 3),
  ],
  [
    ['VBAT', 'VSYS', 'Q2', 'switch'],
    ['VSYS', 'VCC_3V3', 'U11', 'converter'],
    ['VSYS', 'VCC_1V8', 'U12', 'converter'],
    ['VCC_3V3', 'VCC_3V3_SENSOR', 'R30', 'series'],
    ['VCC_1V8', 'VCC_1V8_AUDIO', 'FB31', 'series'],
    ['VCC_3V3', 'VCC_1V8', 'U31', 'converter', false],
  ],
);

const ids = (elements: { data: { id?: string } }[]) => elements.map((e) => e.data.id);

/** A trace shaped like the API's: breadth-first from VBAT over random links, first edge wins. */
function randomTrace(size: number, seed: number): PowerTree {
  let state = seed;
  const random = () => (state = (state * 1103515245 + 12345) % 2147483648) / 2147483648;
  const names = ['VBAT'];
  const links: Link[] = [];
  for (let i = 1; i < size; i++) {
    const name = `VCC_R${i}`;
    links.push([names[Math.floor(random() * names.length)] as string, name, `U${i}`, 'converter']);
    if (i > 3 && random() < 0.1) {
      links.push([names[Math.floor(random() * names.length)] as string, name, `L${i}`, 'series']);
    }
    names.push(name);
  }
  const depth = new Map([['VBAT', 0]]);
  const queue = ['VBAT'];
  const treeLinks = new Set<Link>();
  while (queue.length > 0) {
    const net = queue.shift() as string;
    for (const link of links.filter(([from]) => from === net)) {
      if (depth.has(link[1])) continue;
      depth.set(link[1], (depth.get(net) ?? 0) + 1);
      treeLinks.add(link);
      queue.push(link[1]);
    }
  }
  return trace(
    'VBAT',
    names.map((name) => node(name, depth.get(name) ?? 0)),
    links.map((link): Link => [link[0], link[1], link[2], link[3], treeLinks.has(link)]),
  );
}

/** Reference: graphology's breadth-first traversal over the tree edges of the trace. */
function referenceGraph(tree: PowerTree) {
  const graph = new DirectedGraph();
  for (const n of tree.nodes) graph.addNode(n.net);
  for (const e of tree.edges) if (e.tree) graph.addEdge(e.from, e.to);
  return graph;
}

describe('power tree elements', () => {
  it('counts the rails below each rail as graphology reaches them along the tree edges', () => {
    const tree = randomTrace(300, 5);
    const shape = shapeOfTrace(tree);
    const graph = referenceGraph(tree);
    for (const n of tree.nodes) {
      let reached = 0;
      bfsFromNode(graph, n.net, () => {
        reached += 1;
      });
      expect(shape.subtreeSize.get(n.net), n.net).toBe(reached - 1);
    }
  });

  it('hides exactly the rails that a traversal stopping at collapsed rails never reaches', () => {
    const tree = randomTrace(300, 9);
    const shape = shapeOfTrace(tree);
    const collapsed = new Set(tree.nodes.filter((_, i) => i % 7 === 3).map((n) => n.net));
    const expected = new Set<string>();
    bfsFromNode(referenceGraph(tree), 'VBAT', (net) => {
      expected.add(net);
      return collapsed.has(net);
    });
    expect(visibleRails(shape, collapsed)).toEqual(expected);
  });

  it('draws a collapsed rail with a "+n" marker and none of the rails below it', () => {
    const shape = shapeOfTrace(small);
    const elements = buildTreeElements(shape, { collapsed: new Set(['VSYS']), showLoads: false });
    expect(ids(elements)).toEqual(
      expect.arrayContaining([
        railElementId('VBAT'),
        railElementId('VSYS'),
        markerElementId('VSYS'),
      ]),
    );
    expect(ids(elements)).not.toContain(railElementId('VCC_3V3'));
    expect(elements.find((e) => e.data.id === markerElementId('VSYS'))?.data.label).toBe('+4');
    // no edge may point at a rail that is not drawn
    const drawn = new Set(ids(elements));
    for (const edge of elements.filter((e) => e.group === 'edges')) {
      expect(drawn.has(edge.data.source)).toBe(true);
      expect(drawn.has(edge.data.target)).toBe(true);
    }
  });

  it('keeps a cross link between two drawn rails and marks it as not a tree edge', () => {
    const elements = buildTreeElements(shapeOfTrace(small), {
      collapsed: new Set(),
      showLoads: false,
    });
    const cross = elements.find((e) => e.data.id === linkElementId('VCC_3V3', 'VCC_1V8', 'U31'));
    expect(cross?.classes).toContain('cross');
    expect(cross?.classes).toContain('link-converter');
  });

  it('adds one loads leaf per rail with loads, not one per part', () => {
    const elements = buildTreeElements(shapeOfTrace(small), {
      collapsed: new Set(),
      showLoads: true,
    });
    const leaves = elements.filter((e) => e.classes === 'loads');
    expect(leaves.map((e) => e.data.net)).toEqual(['VBAT', 'VCC_3V3']);
    expect(leaves[0]?.data.label).toBe('12 parts\n10 shunt · 2 draw');
    // the rail is laid out as one block with its leaf beside it
    const rail = elements.find((e) => e.data.id === railElementId('VBAT'));
    expect(rail?.classes).toContain('has-loads');
    expect(rail?.data.blockWidth).toBeGreaterThan(
      (rail?.data.w as number) + (leaves[0]?.data.w as number),
    );
    expect(
      loadSummaryLines(node('X', 0, { loadCount: 1, countsByRole: roles({ other: 1 }) })),
    ).toEqual(['1 part', '1 other']);
  });

  it('treats the rails feeding the start as its children in an upstream trace', () => {
    const up = trace(
      'VCC_1V8',
      [node('VCC_1V8', 0), node('VCC_3V3', 1), node('VSYS', 2)],
      [
        ['VCC_3V3', 'VCC_1V8', 'U31', 'converter'],
        ['VSYS', 'VCC_3V3', 'U11', 'converter'],
      ],
      'up',
    );
    const shape = shapeOfTrace(up);
    expect(shape.childrenOf.get('VCC_1V8')).toEqual(['VCC_3V3']);
    expect(traceAncestors(shape, 'VSYS')).toEqual(['VCC_3V3', 'VCC_1V8']);
    const edge = buildTreeElements(shape, { collapsed: new Set(), showLoads: false }).find(
      (e) => e.group === 'edges',
    );
    // power still flows from the upstream rail to the downstream one
    expect(edge?.data.source).toBe(railElementId('VCC_3V3'));
  });

  it('lights the selected rail, its way from the root and the rest of its coupled group', () => {
    const elements = buildTreeElements(shapeOfTrace(small), {
      collapsed: new Set(),
      showLoads: false,
    });
    const highlight = treeHighlight(
      'VCC_3V3_SENSOR',
      [
        { net: 'VBAT', via: null, kind: null },
        { net: 'VSYS', via: 'Q2', kind: 'switch' },
        { net: 'VCC_3V3', via: 'U11', kind: 'converter' },
        { net: 'VCC_3V3_SENSOR', via: 'R30', kind: 'series' },
      ],
      {
        nets: [
          { name: 'VCC_3V3_SENSOR', kind: 'power', nominalVoltage: 3.3 },
          { name: 'VCC_3V3', kind: 'power', nominalVoltage: 3.3 },
        ],
        links: [],
      },
    );
    const lit = highlightElements(elements, highlight);
    const classesOf = (id: string) => lit.find((e) => e.data.id === id)?.classes ?? '';
    expect(classesOf(railElementId('VCC_3V3_SENSOR'))).toContain('selected');
    expect(classesOf(railElementId('VSYS'))).toContain('on-path');
    expect(classesOf(railElementId('VCC_3V3'))).toContain('in-group');
    expect(classesOf(linkElementId('VSYS', 'VCC_3V3', 'U11'))).toContain('on-path');
    expect(classesOf(linkElementId('VSYS', 'VCC_1V8', 'U12'))).not.toContain('on-path');
    // an element the highlight does not touch is the same object, so the graph skips it
    const untouched = elements.find((e) => e.data.id === railElementId('VCC_1V8_AUDIO'));
    expect(lit).toContain(untouched);
  });

  it('starts a large tree collapsed to about the budget and a small one fully open', () => {
    expect(initiallyCollapsed(shapeOfTrace(small), 100).size).toBe(0);
    const tree = randomTrace(300, 3);
    const shape = shapeOfTrace(tree);
    const collapsed = initiallyCollapsed(shape, 120);
    expect(collapsed.size).toBeGreaterThan(0);
    expect(visibleRails(shape, collapsed).size).toBeLessThanOrEqual(120);
  });

  it('grafts a deeper trace below the rail the depth limit cut off', () => {
    const cut = trace(
      'VBAT',
      [node('VBAT', 0), node('VSYS', 1, { truncated: true, childCount: 1 })],
      [['VBAT', 'VSYS', 'Q2', 'switch']],
    );
    const deeper = trace(
      'VSYS',
      [node('VSYS', 0), node('VCC_3V3', 1)],
      [['VSYS', 'VCC_3V3', 'U11', 'converter']],
    );
    const grafted = graftTrace(cut, deeper);
    expect(grafted.nodes.find((n) => n.net === 'VSYS')?.truncated).toBe(false);
    expect(grafted.nodes.find((n) => n.net === 'VCC_3V3')?.depth).toBe(2);
    expect(shapeOfTrace(grafted).childrenOf.get('VSYS')).toEqual(['VCC_3V3']);
  });
});
