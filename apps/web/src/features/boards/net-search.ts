// The net filter box: "vcc 3v3", "VCC_3V3" and "vcc3v3" all find VCC_3V3. Technicians type
// what they read off a board or a schematic, where separators and case vary.
import type { NetKind, NetRow } from '@railyard/shared';

/** Upper case, letters and digits only. */
export function foldNetName(text: string): string {
  return text.toUpperCase().replace(/[^\p{L}\p{N}]+/gu, '');
}

export type NetSearch = {
  text: string;
  /** Kinds to keep; empty keeps every kind. */
  kinds: ReadonlySet<NetKind>;
};

/** Returns the test for one net, folding the query once rather than once per row. */
export function netMatcher(search: NetSearch): (net: NetRow) => boolean {
  const needle = foldNetName(search.text);
  const kinds = search.kinds;
  return (net) => {
    if (kinds.size > 0 && !kinds.has(net.kind)) return false;
    if (needle === '') return true;
    // normalizedName is folded again: the API's folding may keep characters this one drops.
    if (foldNetName(net.normalizedName).includes(needle)) return true;
    if (foldNetName(net.name).includes(needle)) return true;
    return net.aliases.some((alias) => foldNetName(alias).includes(needle));
  };
}
