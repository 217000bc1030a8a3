// Which nets of a board are ground. Ground matters twice over for a repair: readings are taken
// against it, and a rail that shows a path to it is shorted.
import type { RawComponent } from './board-draft';
import { compareNetNames, isGroundNetName, isPowerRailName } from './net-name';
import { inferComponentKind } from './refdes-kind';

/** share of all connected pins the most connected net must reach to be taken for ground by count */
const minimumPinShare = 0.1;
/** how many times more pins than the next net it must have */
const minimumLeadOverNext = 2;
/** fewer two-terminal capacitors than this say too little about where ground is */
const minimumCapacitors = 3;

/**
 * Ground nets, most connected first.
 *
 * A net is ground when its name says so (isGroundNetName). The most connected net is also ground,
 * whatever it is called (generated names like N0001 do occur), when all of these hold:
 * - it has at least 10 % of all connected pins;
 * - it has at least twice the pins of the next most connected net;
 * - it touches more than half of the two-terminal capacitors, with at least three on the board
 *   (common practice: nearly every decoupling capacitor has one side on ground);
 * - its name does not look like a power rail (isPowerRailName). A big core or I/O rail can touch
 *   as many capacitors as ground does; a name such as VDD_CPU is better evidence than a count.
 */
export function findGroundNets(components: RawComponent[]): string[] {
  const pinCounts = new Map<string, number>();
  let connectedPins = 0;
  for (const component of components) {
    for (const pin of component.pins) {
      if (pin.net === null) continue;
      pinCounts.set(pin.net, (pinCounts.get(pin.net) ?? 0) + 1);
      connectedPins++;
    }
  }

  const ground = new Set<string>();
  for (const net of pinCounts.keys()) {
    if (isGroundNetName(net)) ground.add(net);
  }

  const ranked = [...pinCounts].sort((a, b) => b[1] - a[1] || compareNetNames(a[0], b[0]));
  const [first, second] = ranked;
  if (first && !ground.has(first[0]) && !isPowerRailName(first[0])) {
    const [net, pins] = first;
    const leadsClearly = pins >= minimumLeadOverNext * (second?.[1] ?? 0);
    const largeEnough = pins >= minimumPinShare * connectedPins;
    if (leadsClearly && largeEnough && touchesMostCapacitors(components, net)) ground.add(net);
  }

  return ranked.map(([net]) => net).filter((net) => ground.has(net));
}

function touchesMostCapacitors(components: RawComponent[], net: string): boolean {
  let capacitors = 0;
  let touching = 0;
  for (const component of components) {
    if ((component.kind ?? inferComponentKind(component.refdes)) !== 'capacitor') continue;
    if (component.pins.length !== 2 || component.pins.some((pin) => pin.net === null)) continue;
    capacitors++;
    if (component.pins.some((pin) => pin.net === net)) touching++;
  }
  return capacitors >= minimumCapacitors && touching > capacitors / 2;
}
