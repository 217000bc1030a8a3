// The root of a board's power tree: the net the battery connector feeds. Every rail is reached
// from it, so a repair follows a fault outward from here.
import type { DraftComponent, DraftNet } from './board-draft';
import { compareNetNames, isPowerRailName, normalizeNetName } from './net-name';
import { refdesPrefix } from './refdes-kind';

// VBAT, VBATT, BAT, BATT, BAT+, VBAT+, BATTERY (normalised). BAT- keeps its "-" when normalised
// and so never matches: it is the negative terminal.
const batteryKeyPattern = /^V?BATT?(?:ERY)?\+?$/;

/** Whether a name is one of the usual names of the battery's positive net. */
export function isBatteryNetName(name: string): boolean {
  return batteryKeyPattern.test(normalizeNetName(name));
}

/** Whether a name mentions the battery and reads as a rail, not as a battery signal (BAT_ID, BATT_TEMP). */
function suggestsBattery(name: string): boolean {
  return normalizeNetName(name).includes('BAT') && isPowerRailName(name);
}

/**
 * The root net, or null when the board does not show one (the caller may then take one from the
 * user). Only nets on a pin of a connector count, and a battery holder (refdes BT) is taken for
 * one. Among those, not ground:
 * 1. a net whose name or an alias is a plain battery name (VBAT, VBATT, BATT, BAT+ …);
 * 2. failing that, a net whose name or an alias mentions the battery and reads as a rail
 *    (VBAT_CONN, BATT_IN), not as a battery signal (BAT_ID, BATT_TEMP).
 * Several candidates: the one with most pins on the board, then name order.
 */
export function detectRootNet(
  components: DraftComponent[],
  nets: DraftNet[],
  groundNets: Set<string>,
): string | null {
  const pinCounts = new Map<string, number>();
  const onConnector = new Set<string>();
  for (const component of components) {
    const isConnector = component.kind === 'connector' || refdesPrefix(component.refdes) === 'BT';
    for (const pin of component.pins) {
      if (pin.net === null) continue;
      pinCounts.set(pin.net, (pinCounts.get(pin.net) ?? 0) + 1);
      if (isConnector) onConnector.add(pin.net);
    }
  }

  const candidates = nets.filter((net) => onConnector.has(net.name) && !groundNets.has(net.name));
  const names = (net: DraftNet) => [net.name, ...net.aliases];
  const plain = candidates.filter((net) => names(net).some(isBatteryNetName));
  const chosen =
    plain.length > 0 ? plain : candidates.filter((net) => names(net).some(suggestsBattery));

  const best = chosen
    .map((net) => net.name)
    .sort((a, b) => (pinCounts.get(b) ?? 0) - (pinCounts.get(a) ?? 0) || compareNetNames(a, b))[0];
  return best ?? null;
}
