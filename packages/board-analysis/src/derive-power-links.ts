// Series links: parts a rail passes straight through (inductors, ferrite beads, fuses, zero-ohm
// and current-sense resistors, jumpers). A short behind one of them reads on the rail in front of
// it too, which is why the power tree needs them. Converters and switches cannot be told from a
// netlist and come from annotations.
import type { DraftComponent, DraftPowerLink } from './board-draft';
import { compareNetNames } from './net-name';
import { refdesPrefix } from './refdes-kind';

/** Common practice: shunts and links are at most 1 Ω; anything larger drops a rail noticeably. */
const seriesResistanceLimit = 1;

/** Jumper designators (common practice): JP, and PJ on notebook power sections. */
const jumperPrefixes = new Set(['JP', 'PJ']);

export interface SeriesLinkOptions {
  /** the battery or input net; links are oriented away from it */
  rootNet?: string | null;
  /** links already known (entered converters, switches, series parts) */
  knownLinks?: DraftPowerLink[];
}

/**
 * Whether a part conducts a rail straight through: an inductor, ferrite bead or fuse; a resistor
 * whose value reads as at most 1 Ω (0R links, shunts; a resistor without a readable value is not
 * assumed to be one); a jumper (JP, PJ) of kind other or connector; or an unclassified part whose
 * value reads as at most 1 Ω (a 0R fitted on a W or similar position).
 */
export function isSeriesElement(component: DraftComponent): boolean {
  switch (component.kind) {
    case 'inductor':
    case 'ferrite':
    case 'fuse':
      return true;
    case 'resistor':
      return isLowResistance(component);
    case 'connector':
      return jumperPrefixes.has(refdesPrefix(component.refdes));
    case 'other':
      return jumperPrefixes.has(refdesPrefix(component.refdes)) || isLowResistance(component);
    default:
      return false;
  }
}

function isLowResistance(component: DraftComponent): boolean {
  return (
    component.unit === 'ohm' &&
    component.magnitude !== null &&
    component.magnitude >= 0 &&
    component.magnitude <= seriesResistanceLimit
  );
}

/**
 * Every series element with exactly two pins on two different non-ground nets becomes a `series`
 * link with origin 'derived', unless a known link already goes through the same part (whoever
 * entered it knows the part better than this rule).
 *
 * Direction: with a root net, from the net nearer the root to the farther one, by breadth-first
 * distance over an undirected view of the known links and the series parts, not crossing ground.
 * When both nets are equally far or neither can be reached, and when there is no root, the nets
 * are taken in name order: the direction of a series link then carries no meaning, and nothing
 * that groups coupled rails may rely on it.
 */
export function deriveSeriesLinks(
  components: DraftComponent[],
  groundNets: Set<string>,
  options: SeriesLinkOptions = {},
): DraftPowerLink[] {
  const knownLinks = options.knownLinks ?? [];
  const described = new Set(knownLinks.map((link) => link.via));

  const candidates: { via: string; a: string; b: string }[] = [];
  for (const component of components) {
    if (component.pins.length !== 2 || described.has(component.refdes)) continue;
    if (!isSeriesElement(component)) continue;
    const [a, b] = component.pins.map((pin) => pin.net);
    if (!a || !b || a === b || groundNets.has(a) || groundNets.has(b)) continue;
    candidates.push({ via: component.refdes, a, b });
  }

  const distance = distancesFromRoot(options.rootNet ?? null, groundNets, [
    ...knownLinks.map((link) => [link.from, link.to] as const),
    ...candidates.map((candidate) => [candidate.a, candidate.b] as const),
  ]);

  return candidates.map(({ via, a, b }) => {
    const da = distance.get(a) ?? Number.POSITIVE_INFINITY;
    const db = distance.get(b) ?? Number.POSITIVE_INFINITY;
    const aFirst = da !== db ? da < db : compareNetNames(a, b) <= 0;
    return {
      from: aFirst ? a : b,
      to: aFirst ? b : a,
      via,
      kind: 'series',
      origin: 'derived',
    };
  });
}

function distancesFromRoot(
  root: string | null,
  groundNets: Set<string>,
  edges: (readonly [string, string])[],
): Map<string, number> {
  const distance = new Map<string, number>();
  if (root === null || groundNets.has(root)) return distance;
  const neighbours = new Map<string, string[]>();
  const connect = (from: string, to: string) => {
    const list = neighbours.get(from);
    if (list) list.push(to);
    else neighbours.set(from, [to]);
  };
  for (const [a, b] of edges) {
    if (groundNets.has(a) || groundNets.has(b)) continue;
    connect(a, b);
    connect(b, a);
  }
  distance.set(root, 0);
  const queue = [root];
  for (let head = 0; head < queue.length; head++) {
    const net = queue[head] as string;
    const next = (distance.get(net) ?? 0) + 1;
    for (const neighbour of neighbours.get(net) ?? []) {
      if (distance.has(neighbour)) continue;
      distance.set(neighbour, next);
      queue.push(neighbour);
    }
  }
  return distance;
}
