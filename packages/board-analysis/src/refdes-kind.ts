// The kind of a part from its reference designator prefix. Class letters follow IEEE 315 /
// ASME Y14.44 (quoted from memory): C capacitor, R resistor, RT thermistor, RV varistor,
// L inductor, F fuse, D or CR diode, Q transistor, U integrated circuit, J jack and P plug
// (connectors), Y crystal, TP test point, X socket. Where logic boards commonly depart from the
// standard, common practice wins, and each departure is noted below.
import type { ComponentKind } from '@railyard/shared';

const kindByPrefix: Record<string, ComponentKind> = {
  C: 'capacitor',
  R: 'resistor',
  // resistor networks and arrays (common practice)
  RN: 'resistor',
  RA: 'resistor',
  RP: 'resistor',
  // thermistors behave as resistors for a repair reading
  RT: 'resistor',
  L: 'inductor',
  // ferrite beads and EMI filters are not IEEE 315 classes; FB and FL are common practice
  FB: 'ferrite',
  FL: 'ferrite',
  F: 'fuse',
  D: 'diode',
  CR: 'diode',
  LED: 'diode',
  // Suppressors: a varistor (RV in IEEE 315) and a zener clamp (ZD/DZ, common practice) protect a
  // line the same way a TVS does and, failed short, read the same way. VR is left out: it means a
  // voltage regulator in IEEE 315 and a variable resistor in much common practice, and neither is
  // a suppressor.
  TVS: 'tvs',
  ESD: 'tvs',
  RV: 'tvs',
  ZD: 'tvs',
  DZ: 'tvs',
  // IEEE 315 uses Q for every transistor. On logic boards most Q parts are MOSFET load switches
  // and converter stages, and it is as a MOSFET in front of a rail that a repair treats them
  // (they are what heats first when a rail behind them is shorted), so Q is read as a MOSFET.
  // TR is the older designator for a transistor, usually bipolar.
  Q: 'mosfet',
  FET: 'mosfet',
  TR: 'transistor',
  U: 'ic',
  IC: 'ic',
  J: 'connector',
  P: 'connector',
  CN: 'connector',
  CON: 'connector',
  // X is a socket in IEEE 315, but on logic boards X1 is almost always a crystal (common practice)
  Y: 'crystal',
  X: 'crystal',
  XTAL: 'crystal',
  OSC: 'crystal',
  TP: 'testpoint',
};

// Notebook boards commonly mark the parts of the power section with a leading P (PC, PR, PL, PQ,
// PU, PD, PF); these map to the class after the P. PJ is a power jumper, left as 'other'.
const powerSectionClasses = new Set(['C', 'R', 'L', 'Q', 'U', 'D', 'F']);

/** The letters before the first digit, upper-cased ("c12" → "C", "FB3" → "FB", "TP_4" → "TP"). */
export function refdesPrefix(refdes: string): string {
  const match = /^[^A-Za-z0-9]*([A-Za-z]+)/.exec(refdes.trim());
  return match?.[1]?.toUpperCase() ?? '';
}

export function inferComponentKind(refdes: string): ComponentKind {
  const prefix = refdesPrefix(refdes);
  const direct = kindByPrefix[prefix];
  if (direct) return direct;
  if (prefix.length === 2 && prefix.startsWith('P') && powerSectionClasses.has(prefix.slice(1))) {
    return kindByPrefix[prefix.slice(1)] ?? 'other';
  }
  return 'other';
}
