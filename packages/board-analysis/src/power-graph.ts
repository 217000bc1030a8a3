// A board's power tree held in memory: the rails, the power links between them and the parts on
// each rail, indexed once so that the questions a technician asks of a faulty rail (what does it
// feed, what feeds it, what is electrically the same rail, what hangs on it) are answered without
// scanning the board again. No I/O.
//
// Orders are by code-unit name order (compareNetNames), so a board always comes out the same way.
// Links keep their physical direction (power flows from `from` to `to`) in every answer, also in
// an upstream trace.
import type {
  CoupledGroup,
  LoadRole,
  NetKind,
  PowerEdge,
  PowerLinkKind,
  PowerLinkOrigin,
  PowerTree,
  RailLoads,
  TreeDirection,
  TreeNode,
  UpstreamPath,
} from '@railyard/shared';
import { seriesGroups } from './coupled-groups';
import { compareNetNames } from './net-name';
import { describeRailLoads, emptyRoleCounts, loadRoleOf, type RailLoadPart } from './rail-loads';

/** A board as the power graph needs it; a board draft's nets, power links and components fit. */
export interface PowerGraphInput {
  nets: { name: string; kind: NetKind; nominalVoltage: number | null }[];
  links: {
    from: string;
    to: string;
    via: string;
    kind: PowerLinkKind;
    origin: PowerLinkOrigin;
  }[];
  parts: RailLoadPart[];
  rootNet: string | null;
}

export interface PowerGraph {
  hasNet(name: string): boolean;
  /**
   * The board root first (if set), then every other net with outgoing links and no incoming link,
   * by name: a board may have more than one source (an adapter input and a battery).
   */
  roots(): string[];
  /**
   * Breadth-first from `start` along the links ('down': what it feeds) or against them ('up':
   * what feeds it), each net once however many loops the links make, up to `maxDepth` hops.
   * Nodes come by depth, then name; edges are every link between two returned nodes, `tree`
   * marking the one by which BFS first reached a node.
   */
  trace(start: string, direction: TreeDirection, maxDepth: number): Omit<PowerTree, 'board'>;
  /**
   * Up to `limit` shortest ways down to `net`, root first: from the board root when it reaches
   * the net, otherwise from the other roots that do. Ways differ in the nets they pass; of two
   * parallel links between the same nets the first by refdes stands for both. [] when no root
   * reaches the net; a root itself gives the one way [[{ net, via: null, kind: null }]].
   */
  upstreamPaths(net: string, limit?: number): UpstreamPath[];
  /** Nets joined to `net` by series links only (in either direction), `net` included, by name. */
  coupledGroup(net: string): CoupledGroup;
  loads(net: string): RailLoads;
  /** Links feeding `net`, by source net then via. */
  linksIn(net: string): PowerEdge[];
  /** Links leaving `net`, by destination net then via. */
  linksOut(net: string): PowerEdge[];
}

/** How many ways to a rail `upstreamPaths` gives when not told. */
export const defaultUpstreamPathLimit = 3;

interface GraphNet {
  name: string;
  kind: NetKind;
  nominalVoltage: number | null;
  /** indices into `links`, by destination net then via */
  out: number[];
  /** indices into `links`, by source net then via */
  in: number[];
  loads: { part: number; role: LoadRole }[];
  countsByRole: Record<LoadRole, number>;
}

interface GraphLink {
  from: number;
  to: number;
  edge: PowerEdge;
}

export function createPowerGraph(input: PowerGraphInput): PowerGraph {
  // Net indices follow name order, so sorting indices sorts by name.
  const sortedNets = [...input.nets].sort((a, b) => compareNetNames(a.name, b.name));
  const indexOfName = new Map<string, number>();
  const nets: GraphNet[] = sortedNets.map((net, index) => {
    if (indexOfName.has(net.name)) throw new Error(`net "${net.name}" is listed twice`);
    indexOfName.set(net.name, index);
    return {
      name: net.name,
      kind: net.kind,
      nominalVoltage: net.nominalVoltage,
      out: [],
      in: [],
      loads: [],
      countsByRole: emptyRoleCounts(),
    };
  });

  const rootIndex = input.rootNet === null ? null : indexOfName.get(input.rootNet);
  if (rootIndex === undefined) {
    throw new Error(`root net "${input.rootNet}" is not a net of this board`);
  }

  const partIndexOf = new Map<string, number>();
  input.parts.forEach((part, index) => {
    if (partIndexOf.has(part.refdes)) throw new Error(`part "${part.refdes}" is listed twice`);
    partIndexOf.set(part.refdes, index);
  });

  // rails each part is the via of a link on, for the series role
  const viaRails = new Map<string, Set<number>>();
  const links: GraphLink[] = input.links.map((link, index) => {
    const where = `power link ${index + 1} (${link.via}: ${link.from} → ${link.to})`;
    const from = indexOfName.get(link.from);
    if (from === undefined) throw new Error(`${where}: unknown net "${link.from}" in from`);
    const to = indexOfName.get(link.to);
    if (to === undefined) throw new Error(`${where}: unknown net "${link.to}" in to`);
    const viaPart = partIndexOf.get(link.via);
    let rails = viaRails.get(link.via);
    if (rails === undefined) viaRails.set(link.via, (rails = new Set()));
    rails.add(from).add(to);
    return {
      from,
      to,
      edge: {
        from: link.from,
        to: link.to,
        via: link.via,
        viaKind: viaPart === undefined ? null : input.parts[viaPart]!.kind,
        kind: link.kind,
        origin: link.origin,
      },
    };
  });
  links.forEach((link, index) => {
    nets[link.from]!.out.push(index);
    nets[link.to]!.in.push(index);
  });
  const byVia = (a: number, b: number) => compareNetNames(links[a]!.edge.via, links[b]!.edge.via);
  for (const net of nets) {
    net.out.sort((a, b) => links[a]!.to - links[b]!.to || byVia(a, b));
    net.in.sort((a, b) => links[a]!.from - links[b]!.from || byVia(a, b));
  }

  // Parts on each rail, with their role there
  input.parts.forEach((part, partIndex) => {
    const railsOfPart = new Set<number>();
    let groundRails = 0;
    for (const pin of part.pins) {
      if (pin.net === null) continue;
      const net = indexOfName.get(pin.net);
      if (net === undefined) {
        throw new Error(`part "${part.refdes}" pin "${pin.pin}": unknown net "${pin.net}"`);
      }
      if (railsOfPart.has(net)) continue;
      railsOfPart.add(net);
      if (nets[net]!.kind === 'ground') groundRails += 1;
    }
    const linkedRails = viaRails.get(part.refdes);
    for (const net of railsOfPart) {
      const rail = nets[net]!;
      const role = loadRoleOf(part.kind, {
        isViaOfRailLink: linkedRails?.has(net) ?? false,
        hasOtherPinOnGround: groundRails - (rail.kind === 'ground' ? 1 : 0) > 0,
      });
      rail.loads.push({ part: partIndex, role });
      rail.countsByRole[role] += 1;
    }
  });

  // Coupled groups: members by name, series links by source, destination, via
  const seriesLinkIndices = links.flatMap((link, index) =>
    link.edge.kind === 'series' ? [index] : [],
  );
  const { groupOf, groupCount } = seriesGroups(
    nets.length,
    seriesLinkIndices.map((index) => links[index]!),
  );
  const groupNets: number[][] = Array.from({ length: groupCount }, () => []);
  for (let net = 0; net < nets.length; net++) groupNets[groupOf[net]!]!.push(net);
  const groupLinks: number[][] = Array.from({ length: groupCount }, () => []);
  seriesLinkIndices
    .sort((a, b) => links[a]!.from - links[b]!.from || links[a]!.to - links[b]!.to || byVia(a, b))
    .forEach((index) => groupLinks[groupOf[links[index]!.from]!]!.push(index));

  const otherRoots = nets.flatMap((net, index) =>
    index !== rootIndex && net.out.length > 0 && net.in.length === 0 ? [index] : [],
  );
  const rootOrder = rootIndex === null ? otherRoots : [rootIndex, ...otherRoots];

  const netIndex = (name: string): number => {
    const index = indexOfName.get(name);
    if (index === undefined) throw new Error(`unknown net "${name}"`);
    return index;
  };
  // Scratch space of `trace`, indexed by net: −1 = not reached. Every trace puts back the −1s it
  // changed before returning, so a trace costs what it reaches, not the size of the board.
  const traceDepth = new Int32Array(nets.length).fill(-1);
  const traceReachedBy = new Int32Array(nets.length);

  const copyEdge = (link: number): PowerEdge => ({ ...links[link]!.edge });

  /**
   * Hop distances from `source` along the links, level by level, stopping once `target` is
   * labelled: every net nearer than the target is labelled by then, which is all that the
   * enumeration of shortest ways needs.
   */
  const distancesTo = (source: number, target: number): Map<number, number> | null => {
    const distance = new Map([[source, 0]]);
    let level = [source];
    for (let hops = 1; level.length > 0 && !distance.has(target); hops++) {
      const next: number[] = [];
      for (const net of level) {
        for (const link of nets[net]!.out) {
          const to = links[link]!.to;
          if (distance.has(to)) continue;
          distance.set(to, hops);
          next.push(to);
        }
      }
      level = next;
    }
    return distance.has(target) ? distance : null;
  };

  /** Up to `limit` shortest ways from `source` to `target`, each as the links taken. */
  const shortestWays = (source: number, target: number, limit: number): number[][] => {
    const distance = distancesTo(source, target);
    if (distance === null) return [];
    const ways: number[][] = [];
    const taken: number[] = [];
    // Walking back from the target over links that lose one hop each time ends at the source on
    // every branch, so the walk never backtracks out of a dead end.
    const walkBack = (net: number): void => {
      if (net === source) {
        ways.push([...taken].reverse());
        return;
      }
      const hops = distance.get(net)!;
      let previousFrom = -1;
      for (const link of nets[net]!.in) {
        if (ways.length >= limit) return;
        const from = links[link]!.from;
        if (from === previousFrom) continue;
        previousFrom = from;
        if (distance.get(from) !== hops - 1) continue;
        taken.push(link);
        walkBack(from);
        taken.pop();
      }
    };
    walkBack(target);
    return ways;
  };

  return {
    hasNet: (name) => indexOfName.has(name),

    roots: () => rootOrder.map((index) => nets[index]!.name),

    trace(start, direction, maxDepth) {
      const startIndex = netIndex(start);
      if (!Number.isInteger(maxDepth) || maxDepth < 0) {
        throw new RangeError(
          `trace depth must be a whole number of hops, 0 or more; got ${maxDepth}`,
        );
      }
      const down = direction === 'down';
      const children = (net: number) => (down ? nets[net]!.out : nets[net]!.in);
      const childOf = (link: number) => (down ? links[link]!.to : links[link]!.from);

      const depthOf = traceDepth;
      depthOf[startIndex] = 0;
      const order = [startIndex];
      let level = [startIndex];
      for (let depth = 1; depth <= maxDepth && level.length > 0; depth++) {
        const next: number[] = [];
        for (const net of level) {
          for (const link of children(net)) {
            const child = childOf(link);
            if (depthOf[child] !== -1) continue;
            depthOf[child] = depth;
            traceReachedBy[child] = link;
            next.push(child);
          }
        }
        next.sort((a, b) => a - b);
        for (const net of next) order.push(net);
        level = next;
      }

      const nodes: TreeNode[] = [];
      const edges: PowerTree['edges'] = [];
      for (const index of order) {
        const net = nets[index]!;
        const depth = depthOf[index]!;
        let truncated = false;
        for (const link of children(index)) {
          const child = childOf(link);
          if (depthOf[child] === -1) {
            truncated = true;
            continue;
          }
          const edge = links[link]!.edge;
          edges.push({
            from: edge.from,
            to: edge.to,
            via: edge.via,
            viaKind: edge.viaKind,
            kind: edge.kind,
            origin: edge.origin,
            tree: child !== startIndex && traceReachedBy[child] === link,
          });
        }
        const counts = net.countsByRole;
        nodes.push({
          net: net.name,
          kind: net.kind,
          nominalVoltage: net.nominalVoltage,
          depth,
          loadCount: net.loads.length,
          countsByRole: {
            shunt: counts.shunt,
            draw: counts.draw,
            series: counts.series,
            other: counts.other,
          },
          childCount: children(index).length,
          truncated,
        });
      }
      for (const index of order) depthOf[index] = -1;
      return { start, direction, depth: maxDepth, nodes, edges };
    },

    upstreamPaths(net, limit = defaultUpstreamPathLimit) {
      const target = netIndex(net);
      if (!Number.isInteger(limit) || limit < 0) {
        throw new RangeError(`path limit must be a whole number, 0 or more; got ${limit}`);
      }
      if (limit === 0) return [];
      let waysByRoot: number[][][] = [];
      if (rootIndex !== null) waysByRoot = [shortestWays(rootIndex, target, limit)];
      if (waysByRoot[0] === undefined || waysByRoot[0].length === 0) {
        waysByRoot = otherRoots
          .map((root) => shortestWays(root, target, limit))
          .filter((ways) => ways.length > 0);
      }

      // Taking ways from the roots in turn keeps every feeding root in the answer when the limit
      // allows, rather than filling it with one root's alternatives.
      const chosen: { root: number; links: number[] }[] = [];
      for (let turn = 0; chosen.length < limit; turn++) {
        let any = false;
        for (const [position, ways] of waysByRoot.entries()) {
          const way = ways[turn];
          if (way === undefined) continue;
          any = true;
          if (chosen.length < limit) chosen.push({ root: position, links: way });
        }
        if (!any) break;
      }
      chosen.sort((a, b) => a.links.length - b.links.length || a.root - b.root);

      return chosen.map(({ links: way }) => {
        const first = way[0] === undefined ? target : links[way[0]]!.from;
        return [
          { net: nets[first]!.name, via: null, kind: null },
          ...way.map((link) => ({
            net: links[link]!.edge.to,
            via: links[link]!.edge.via,
            kind: links[link]!.edge.kind,
          })),
        ];
      });
    },

    coupledGroup(net) {
      const group = groupOf[netIndex(net)]!;
      return {
        nets: groupNets[group]!.map((index) => {
          const member = nets[index]!;
          return { name: member.name, kind: member.kind, nominalVoltage: member.nominalVoltage };
        }),
        links: groupLinks[group]!.map(copyEdge),
      };
    },

    loads(net) {
      const rail = nets[netIndex(net)]!;
      return describeRailLoads(
        rail.name,
        rail.loads.map(({ part, role }) => ({ part: input.parts[part]!, role })),
      );
    },

    linksIn: (net) => nets[netIndex(net)]!.in.map(copyEdge),
    linksOut: (net) => nets[netIndex(net)]!.out.map(copyEdge),
  };
}
