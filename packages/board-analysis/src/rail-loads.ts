// What hangs on a rail: every part with a pin on it, the role it plays there, and the rail's
// capacitance to ground. A technician with a shorted rail works through this list.
//
// The role of a part on a rail, first rule that applies:
// 1. `series`: the part is the via of a power link that touches this rail (a regulator, load
//    switch, MOSFET, inductor, ferrite, fuse or 0-ohm link that carries the rail on or in);
// 2. `shunt`: a capacitor, TVS, diode or resistor with another pin on a ground net (decoupling,
//    bulk capacitance, clamps, bleeders: the usual suspects of a short to ground);
// 3. `draw`: an IC, connector, MOSFET, transistor, crystal or other part that is not the via of a
//    link on this rail (it takes current from the rail, or passes it off the board);
// 4. `other`: anything else, e.g. a pull-up resistor from the rail to a signal, a capacitor to a
//    net that is not ground, a test point, a ferrite in a signal line.
//
// Capacitance sums only shunt capacitors whose value reads in farads. A capacitor whose value
// could not be read (magnitude null, or a unit other than F) is listed as unparsed, never guessed.
import {
  loadRoles,
  type BoardSide,
  type ComponentKind,
  type LoadRole,
  type RailLoads,
  type RailPart,
} from '@railyard/shared';
import { compareNetNames } from './net-name';

/** A part as the power graph receives it (a board draft's component fits). */
export interface RailLoadPart {
  refdes: string;
  kind: ComponentKind;
  value: string;
  magnitude: number | null;
  unit: string | null;
  package: string;
  side: BoardSide | null;
  pins: { pin: string; net: string | null }[];
}

const shuntKinds: ReadonlySet<ComponentKind> = new Set(['capacitor', 'tvs', 'diode', 'resistor']);
const drawKinds: ReadonlySet<ComponentKind> = new Set([
  'ic',
  'connector',
  'mosfet',
  'transistor',
  'crystal',
  'other',
]);

/** The role of a part on one rail; the rule is in the file header. */
export function loadRoleOf(
  kind: ComponentKind,
  onRail: {
    /** the part is the via of a power link from or to this rail */
    isViaOfRailLink: boolean;
    /** a pin of the part that is not on this rail sits on a ground net */
    hasOtherPinOnGround: boolean;
  },
): LoadRole {
  if (onRail.isViaOfRailLink) return 'series';
  if (shuntKinds.has(kind) && onRail.hasOtherPinOnGround) return 'shunt';
  if (drawKinds.has(kind)) return 'draw';
  return 'other';
}

/** A count for every role, zero included, in the contract's role order. */
export function emptyRoleCounts(): Record<LoadRole, number> {
  const counts = {} as Record<LoadRole, number>;
  for (const role of loadRoles) counts[role] = 0;
  return counts;
}

/** The load list of `rail` from its parts and their roles there, sorted by refdes. */
export function describeRailLoads(
  rail: string,
  loads: readonly { part: RailLoadPart; role: LoadRole }[],
): RailLoads {
  const parts: RailPart[] = [];
  const countsByRole = emptyRoleCounts();
  const countsByKind: Record<string, number> = {};
  let totalFarads = 0;
  let counted = 0;
  const unparsed: string[] = [];

  const sorted = [...loads].sort((a, b) => compareNetNames(a.part.refdes, b.part.refdes));
  for (const { part, role } of sorted) {
    const pins: string[] = [];
    const otherNets = new Set<string>();
    for (const pin of part.pins) {
      if (pin.net === rail) pins.push(pin.pin);
      else if (pin.net !== null) otherNets.add(pin.net);
    }
    parts.push({
      refdes: part.refdes,
      kind: part.kind,
      value: part.value,
      magnitude: part.magnitude,
      unit: part.unit,
      package: part.package,
      side: part.side,
      role,
      pins,
      otherNets: [...otherNets].sort(compareNetNames),
    });
    countsByRole[role] += 1;
    countsByKind[part.kind] = (countsByKind[part.kind] ?? 0) + 1;

    if (part.kind === 'capacitor' && role === 'shunt') {
      if (part.unit === 'F' && part.magnitude !== null && Number.isFinite(part.magnitude)) {
        totalFarads += part.magnitude;
        counted += 1;
      } else {
        unparsed.push(part.refdes);
      }
    }
  }

  return { parts, countsByRole, countsByKind, capacitance: { totalFarads, counted, unparsed } };
}
