// Turns a traced power tree into the nodes and edges the graph draws: which rails show when
// subtrees are collapsed, the "+n" marker on a collapsed rail, one summary leaf per rail for its
// loads, and the classes that light the selected rail and its way up to the root.
// No drawing here, so it can be tested without a browser.
import type { CoupledGroup, LoadRole, PowerTree, TreeNode, UpstreamPath } from '@railyard/shared';
import type { ElementDefinition } from 'cytoscape';
import { formatVolts } from '../../lib/quantity-format';

export type TraceEdge = PowerTree['edges'][number];

/** The tree edges of a trace as parent → children in the traced direction. */
export type TraceShape = {
  tree: PowerTree;
  nodeByNet: ReadonlyMap<string, TreeNode>;
  childrenOf: ReadonlyMap<string, readonly string[]>;
  parentOf: ReadonlyMap<string, string>;
  /** rails below each rail along tree edges, itself not counted */
  subtreeSize: ReadonlyMap<string, number>;
  /** the start, then any rail the tree edges do not reach (kept visible, never hidden) */
  tops: readonly string[];
};

export const railElementId = (net: string) => `rail:${net}`;
export const markerElementId = (net: string) => `marker:${net}`;
export const loadsElementId = (net: string) => `loads:${net}`;
export const linkElementId = (from: string, to: string, via: string | null) =>
  `link:${from}\u2192${to}:${via ?? ''}`;

/** In a downstream trace a rail's children are the rails it feeds; upstream, the ones feeding it. */
function traceEnds(direction: PowerTree['direction'], edge: TraceEdge) {
  return direction === 'down'
    ? { parent: edge.from, child: edge.to }
    : { parent: edge.to, child: edge.from };
}

export function shapeOfTrace(tree: PowerTree): TraceShape {
  const nodeByNet = new Map(tree.nodes.map((node) => [node.net, node]));
  const childrenOf = new Map<string, string[]>();
  const parentOf = new Map<string, string>();
  for (const edge of tree.edges) {
    if (!edge.tree) continue;
    const { parent, child } = traceEnds(tree.direction, edge);
    // A malformed answer must not make a loop: each rail keeps the first parent that reached it.
    if (!nodeByNet.has(parent) || !nodeByNet.has(child) || parentOf.has(child)) continue;
    if (child === tree.start) continue;
    parentOf.set(child, parent);
    const siblings = childrenOf.get(parent);
    if (siblings) siblings.push(child);
    else childrenOf.set(parent, [child]);
  }

  const tops = [tree.start, ...tree.nodes.map((n) => n.net).filter((net) => net !== tree.start)]
    .filter((net) => nodeByNet.has(net) && !parentOf.has(net))
    .filter((net, i, all) => all.indexOf(net) === i);

  // Post-order without recursion: a deep tree must not overflow the stack.
  const subtreeSize = new Map<string, number>();
  const order: string[] = [];
  const stack = [...tops];
  const visited = new Set<string>();
  while (stack.length > 0) {
    const net = stack.pop() as string;
    if (visited.has(net)) continue;
    visited.add(net);
    order.push(net);
    for (const child of childrenOf.get(net) ?? []) stack.push(child);
  }
  for (let i = order.length - 1; i >= 0; i--) {
    const net = order[i] as string;
    let size = 0;
    for (const child of childrenOf.get(net) ?? []) size += 1 + (subtreeSize.get(child) ?? 0);
    subtreeSize.set(net, size);
  }
  return { tree, nodeByNet, childrenOf, parentOf, subtreeSize, tops };
}

/** The rails above `net` along tree edges, nearest first; the rail itself not included. */
export function traceAncestors(shape: TraceShape, net: string): string[] {
  const ancestors: string[] = [];
  let current = shape.parentOf.get(net);
  while (current !== undefined && !ancestors.includes(current)) {
    ancestors.push(current);
    current = shape.parentOf.get(current);
  }
  return ancestors;
}

/** Rails left on screen when the rails in `collapsed` hide everything below them. */
export function visibleRails(shape: TraceShape, collapsed: ReadonlySet<string>): Set<string> {
  const visible = new Set<string>();
  const queue = [...shape.tops];
  while (queue.length > 0) {
    const net = queue.shift() as string;
    if (visible.has(net)) continue;
    visible.add(net);
    if (collapsed.has(net)) continue;
    queue.push(...(shape.childrenOf.get(net) ?? []));
  }
  return visible;
}

/**
 * For a large tree, the rails to start collapsed so about `budget` rails show: every rail with
 * children on the first level (from the top) at which the running total would pass the budget.
 */
export function initiallyCollapsed(shape: TraceShape, budget: number): Set<string> {
  if (shape.nodeByNet.size <= budget) return new Set();
  const levels: string[][] = [];
  const queue = shape.tops.map((net) => ({ net, level: 0 }));
  const seen = new Set<string>();
  while (queue.length > 0) {
    const { net, level } = queue.shift() as { net: string; level: number };
    if (seen.has(net)) continue;
    seen.add(net);
    (levels[level] ??= []).push(net);
    for (const child of shape.childrenOf.get(net) ?? [])
      queue.push({ net: child, level: level + 1 });
  }
  let shown = levels[0]?.length ?? 0;
  for (let level = 1; level < levels.length; level++) {
    const here = levels[level] ?? [];
    if (shown + here.length > budget) {
      // The top and the rails it feeds always show, however wide that first level is.
      const cut = levels[Math.max(1, level - 1)] ?? [];
      return new Set(cut.filter((net) => (shape.childrenOf.get(net)?.length ?? 0) > 0));
    }
    shown += here.length;
  }
  return new Set();
}

// Also the order roles are listed in. Kept here rather than taken from the contract's list, which
// would bring the contract's validation code into this page for four words.
export const loadRoleOrder = {
  shunt: 'shunt',
  draw: 'draw',
  series: 'series',
  other: 'other',
} as const satisfies Record<LoadRole, string>;
export const loadRolesInOrder = Object.keys(loadRoleOrder) as LoadRole[];

/** The text of a rail's loads leaf, e.g. ["47 parts", "31 shunt · 6 draw", "2 series"]. */
export function loadSummaryLines(node: TreeNode): string[] | null {
  if (node.loadCount <= 0) return null;
  const roles = loadRolesInOrder
    .map((role) => [role, node.countsByRole[role] ?? 0] as const)
    .filter(([, count]) => count > 0)
    .map(([role, count]) => `${count} ${loadRoleOrder[role]}`);
  const lines = [`${node.loadCount} ${node.loadCount === 1 ? 'part' : 'parts'}`];
  // Two roles a line keeps the leaf about as wide as a rail.
  for (let i = 0; i < roles.length; i += 2) lines.push(roles.slice(i, i + 2).join(' · '));
  return lines;
}

// Labels are drawn in a monospace face whose advance is 0.6 em, so a label's width follows
// from its longest line; cytoscape cannot size a node to its label by itself.
const monoAdvance = 0.6;
export const railFontSize = 12;
export const loadsFontSize = 10.5;

function labelBox(lines: string[], fontSize: number, padX: number, lineHeight: number) {
  const longest = Math.max(...lines.map((line) => line.length));
  return {
    w: Math.max(48, Math.ceil(longest * fontSize * monoAdvance + 2 * padX)),
    h: Math.ceil(lines.length * fontSize * lineHeight + 14),
  };
}

/** Space between a rail and its loads leaf, which sits to its right. */
export const loadsGap = 16;

export type TreeElementOptions = {
  collapsed: ReadonlySet<string>;
  showLoads: boolean;
};

/**
 * The graph's elements without highlight classes. Highlighting is applied separately, so moving
 * the selection never changes this list, and the graph is not laid out again for it.
 */
export function buildTreeElements(
  shape: TraceShape,
  { collapsed, showLoads }: TreeElementOptions,
): ElementDefinition[] {
  const { tree } = shape;
  const visible = visibleRails(shape, collapsed);
  const elements: ElementDefinition[] = [];

  for (const node of tree.nodes) {
    if (!visible.has(node.net)) continue;
    const volts = formatVolts(node.nominalVoltage);
    const lines = volts ? [node.net, volts] : [node.net];
    const classes = ['rail', `net-${node.kind}`];
    if (node.net === tree.start) classes.push('start');
    const railIndex = elements.length;
    elements.push({
      group: 'nodes',
      data: {
        id: railElementId(node.net),
        net: node.net,
        label: lines.join('\n'),
        ...labelBox(lines, railFontSize, 12, 1.25),
      },
      classes: classes.join(' '),
    });

    const children = shape.childrenOf.get(node.net)?.length ?? 0;
    const isCollapsed = children > 0 && collapsed.has(node.net);
    if (children > 0 || node.truncated) {
      const label =
        node.truncated && children === 0
          ? '\u22ef'
          : isCollapsed
            ? `+${shape.subtreeSize.get(node.net) ?? 0}`
            : '\u2212';
      elements.push({
        group: 'nodes',
        data: {
          id: markerElementId(node.net),
          net: node.net,
          label,
          w: Math.max(18, label.length * 7 + 8),
          h: 16,
        },
        classes: `marker ${node.truncated && children === 0 ? 'deeper' : isCollapsed ? 'collapsed' : 'expanded'}`,
      });
    }

    const summary = showLoads ? loadSummaryLines(node) : null;
    if (summary) {
      const leaf = labelBox(summary, loadsFontSize, 8, 1.2);
      const rail = elements[railIndex] as ElementDefinition;
      // Laid out as one block with its rail (see loadsGap), so dagre keeps them side by side.
      rail.data.blockWidth = (rail.data.w as number) + loadsGap + leaf.w;
      rail.classes = `${rail.classes ?? ''} has-loads`;
      elements.push({
        group: 'nodes',
        data: { id: loadsElementId(node.net), net: node.net, label: summary.join('\n'), ...leaf },
        classes: 'loads',
      });
      elements.push({
        group: 'edges',
        data: {
          id: `${loadsElementId(node.net)}:edge`,
          source: railElementId(node.net),
          target: loadsElementId(node.net),
        },
        classes: 'loads-link',
      });
    }
  }

  const seen = new Set<string>();
  for (const edge of tree.edges) {
    if (!visible.has(edge.from) || !visible.has(edge.to)) continue;
    const id = linkElementId(edge.from, edge.to, edge.via);
    if (seen.has(id)) continue;
    seen.add(id);
    elements.push({
      group: 'edges',
      data: {
        id,
        // Power always flows top to bottom, upstream trace or not.
        source: railElementId(edge.from),
        target: railElementId(edge.to),
        via: edge.via,
        kind: edge.kind,
      },
      classes: `link link-${edge.kind}${edge.tree ? '' : ' cross'}`,
    });
  }
  return elements;
}

export type TreeHighlight = {
  selected: string | null;
  /** rails on the way from the root down to the selected rail */
  pathRails: ReadonlySet<string>;
  pathLinks: ReadonlySet<string>;
  /** the selected rail's coupled group: a short on one of them reads on all */
  groupRails: ReadonlySet<string>;
};

export function treeHighlight(
  selected: string | null,
  path: UpstreamPath | undefined,
  group: CoupledGroup | undefined,
): TreeHighlight {
  const pathRails = new Set<string>();
  const pathLinks = new Set<string>();
  for (const [i, step] of (path ?? []).entries()) {
    pathRails.add(step.net);
    const previous = path?.[i - 1];
    if (previous) pathLinks.add(linkElementId(previous.net, step.net, step.via));
  }
  return {
    selected,
    pathRails,
    pathLinks,
    groupRails: new Set((group?.nets ?? []).map((net) => net.name)),
  };
}

/** The elements with highlight classes added; unchanged elements keep their identity. */
export function highlightElements(
  elements: readonly ElementDefinition[],
  highlight: TreeHighlight,
): ElementDefinition[] {
  return elements.map((element) => {
    const id = element.data.id ?? '';
    const net = element.data.net as string | undefined;
    const extra: string[] = [];
    if (element.group === 'edges') {
      if (highlight.pathLinks.has(id)) extra.push('on-path');
    } else if (net !== undefined && id === railElementId(net)) {
      if (net === highlight.selected) extra.push('selected');
      else if (highlight.pathRails.has(net)) extra.push('on-path');
      if (net !== highlight.selected && highlight.groupRails.has(net)) extra.push('in-group');
    }
    if (extra.length === 0) return element;
    return { ...element, classes: `${element.classes ?? ''} ${extra.join(' ')}` };
  });
}

/**
 * Grafts a deeper trace started at a rail of `base` (the rail the depth limit cut off) into it.
 * Rails already in `base` stay where they are; new ones take depths below the graft point.
 */
export function graftTrace(base: PowerTree, deeper: PowerTree): PowerTree {
  const at = base.nodes.find((node) => node.net === deeper.start);
  if (!at || deeper.direction !== base.direction) return base;
  const known = new Set(base.nodes.map((node) => node.net));
  const added = new Set<string>();
  const nodes = base.nodes.map((node) => {
    if (node.net !== deeper.start) return node;
    const fresh = deeper.nodes.find((n) => n.net === deeper.start);
    return { ...node, truncated: fresh?.truncated ?? false };
  });
  for (const node of deeper.nodes) {
    if (known.has(node.net)) continue;
    nodes.push({ ...node, depth: at.depth + node.depth });
    added.add(node.net);
  }
  const edgeIds = new Set(base.edges.map((e) => linkElementId(e.from, e.to, e.via)));
  const edges = [...base.edges];
  for (const edge of deeper.edges) {
    if (edgeIds.has(linkElementId(edge.from, edge.to, edge.via))) continue;
    const { child } = traceEnds(base.direction, edge);
    // Only an edge that brought in a new rail may be its tree edge; the rest are cross links.
    edges.push({ ...edge, tree: edge.tree && added.has(child) });
  }
  return { ...base, nodes, edges };
}
