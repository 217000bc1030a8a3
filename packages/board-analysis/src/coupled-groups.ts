// Coupled groups: nets joined only by series links (inductor, ferrite, fuse, 0-ohm link, resistor
// of an ohm or less) are electrically one rail, so a short to ground anywhere in the group reads
// on every net of it, and the whole group is where the faulty part may sit (common practice).
// Converters and switches separate groups: behind a load switch that is off, or a regulator, the
// downstream rail reads on its own.
//
// Why the boundary matters at the bench (common practice): when current is injected into a
// shorted rail, the first part to heat can be the MOSFET or switch in front of the shorted line
// rather than the faulty part, so the search goes on below that switch, inside the next group.

/** The ends of a series link, as net indices. */
export interface SeriesLinkEnds {
  from: number;
  to: number;
}

/**
 * Group number of every net (0 … groupCount − 1, numbered by the lowest net index in the group),
 * joining the ends of each series link, in either direction.
 */
export function seriesGroups(
  netCount: number,
  seriesLinks: readonly SeriesLinkEnds[],
): { groupOf: Int32Array; groupCount: number } {
  const parent = new Int32Array(netCount);
  const size = new Int32Array(netCount).fill(1);
  for (let i = 0; i < netCount; i++) parent[i] = i;

  const find = (net: number): number => {
    let at = net;
    while (parent[at] !== at) {
      // path halving keeps later finds short without recursion
      const grandparent = parent[parent[at]!]!;
      parent[at] = grandparent;
      at = grandparent;
    }
    return at;
  };

  for (const { from, to } of seriesLinks) {
    if (from < 0 || from >= netCount || to < 0 || to >= netCount) {
      throw new RangeError(`series link ${from} → ${to} names a net outside 0…${netCount - 1}`);
    }
    let a = find(from);
    let b = find(to);
    if (a === b) continue;
    if (size[a]! < size[b]!) [a, b] = [b, a];
    parent[b] = a;
    size[a]! += size[b]!;
  }

  const groupOf = new Int32Array(netCount);
  const numberOfRoot = new Int32Array(netCount).fill(-1);
  let groupCount = 0;
  for (let net = 0; net < netCount; net++) {
    const root = find(net);
    if (numberOfRoot[root] === -1) numberOfRoot[root] = groupCount++;
    groupOf[net] = numberOfRoot[root]!;
  }
  return { groupOf, groupCount };
}
