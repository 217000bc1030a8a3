// Finds a rail on one board from what a technician typed: "3v3", "vcc 3v3", "VCC-3V3" and a slip
// such as "vcc_3v4" all lead to VCC_3V3. Names and aliases are folded the same way as the query,
// then matched by edit distance anywhere in the name (fuse.js's Bitap search with location off).
// Most keystrokes are part of a name typed without a slip: when the folded text appears as it is in
// enough names to fill the list, those exact hits are the answer (they rank above any fuzzy match)
// and fuse.js is not asked, which keeps a 5,000-net board well under 5 ms a keystroke.
import type { NetKind, NetRow } from '@railyard/shared';
import Fuse, { type IFuseOptions } from 'fuse.js/basic';
import { naturalCompare } from '../../lib/natural-order';

/**
 * Upper case with the separators people put between the words of a rail name dropped
 * (`_ - . /` and white space). Marks that change what a net is (`+`, `#`, `!`) stay.
 */
export function normalizeRailText(text: string): string {
  return text.toUpperCase().replace(/[\s_\-./]+/g, '');
}

/** Share of the typed characters that may be wrong, missing or extra in a match. */
export const railMatchThreshold = 0.34;

type RailRecord = {
  /** folded printed name or alias: the text searched */
  key: string;
  net: NetRow;
  /** the alias this record stands for; null for the printed name */
  alias: string | null;
};

export type RailMatch = {
  net: NetRow;
  /** the alias that matched, when the printed name itself did not match as well */
  matchedAlias: string | null;
  /** typed characters that had to change: 0 when the folded text appears as it was typed */
  errors: number;
};

export type RailIndex = {
  readonly size: number;
  /** Best matches first; at most `limit` nets, each once. */
  search(query: string, limit?: number): RailMatch[];
};

// Chosen for speed on a few thousand short keys: no location weighting (a rail's distinctive part
// is as often at the end as at the start), one key per record, no field-length norm (keys have no
// words), and case folding done once at build time instead of once per record per keystroke.
const fuseOptions: IFuseOptions<RailRecord> = {
  keys: ['key'],
  includeScore: true,
  ignoreLocation: true,
  ignoreFieldNorm: true,
  isCaseSensitive: true,
  threshold: railMatchThreshold,
  shouldSort: false,
};

const kindRank: Record<NetKind, number> = { power: 0, ground: 1, signal: 2 };

type Candidate = RailRecord & { errors: number; whole: boolean; prefix: boolean };

// Fewest errors first; among equals, the name typed in full, then a name that starts with the
// text, then rails before signals, then the shortest name (VCC_3V3 before VCC_3V3_SENSOR).
function byRank(a: Candidate, b: Candidate): number {
  return (
    a.errors - b.errors ||
    Number(b.whole) - Number(a.whole) ||
    Number(b.prefix) - Number(a.prefix) ||
    kindRank[a.net.kind] - kindRank[b.net.kind] ||
    Number(a.alias !== null) - Number(b.alias !== null) ||
    a.key.length - b.key.length ||
    naturalCompare(a.net.name, b.net.name)
  );
}

/** `count` consecutive pieces of `text`, as even in length as they can be. */
function splitIntoPieces(text: string, count: number): string[] {
  const pieces: string[] = [];
  const size = text.length / count;
  for (let i = 0; i < count; i++) pieces.push(text.slice(Math.round(i * size), Math.round((i + 1) * size)));
  return pieces.filter((piece) => piece !== '');
}

export function buildRailIndex(nets: readonly NetRow[]): RailIndex {
  const records: RailRecord[] = [];
  for (const net of nets) {
    // normalizedName is folded again: the API keeps marks (a trailing `-`) that the query loses.
    records.push({ key: normalizeRailText(net.normalizedName || net.name), net, alias: null });
    for (const alias of net.aliases) {
      const key = normalizeRailText(alias);
      if (key !== '') records.push({ key, net, alias });
    }
  }
  const fuse = new Fuse(records, fuseOptions, Fuse.createIndex(fuseOptions.keys ?? [], records));

  return {
    size: nets.length,
    search(query, limit = 8) {
      const needle = normalizeRailText(query);
      if (needle === '' || limit <= 0) return [];
      // Best record per net, then the best `limit` nets by insertion into a short sorted list:
      // a one-letter query matches thousands of names, and sorting them all costs more than
      // the search itself.
      const exact = records.filter((record) => record.key.includes(needle));
      const exactNets = new Set(exact.map((record) => record.net.name));
      let hits: { item: RailRecord; score?: number }[];
      if (exactNets.size >= limit) {
        hits = exact.map((item) => ({ item, score: 0 }));
      } else {
        // Pigeonhole: with k errors allowed, a match holds one of k + 1 pieces of the text unchanged.
        // Only names holding a piece go to fuse.js, so it scores tens of names instead of thousands.
        const pieces = splitIntoPieces(needle, Math.floor(railMatchThreshold * needle.length) + 1);
        const candidates = records.filter((record) => pieces.some((piece) => record.key.includes(piece)));
        hits = candidates.length === records.length ? fuse.search(needle) : new Fuse(candidates, fuseOptions).search(needle);
      }
      const bestPerNet = new Map<string, Candidate>();
      for (const { item, score = 0 } of hits) {
        const candidate: Candidate = {
          key: item.key,
          net: item.net,
          alias: item.alias,
          // Fuse reports errors ÷ typed length, with 0.001 standing for an exact hit.
          errors: Math.round(score * needle.length),
          whole: item.key === needle,
          prefix: item.key.startsWith(needle),
        };
        const held = bestPerNet.get(item.net.name);
        if (!held || byRank(candidate, held) < 0) bestPerNet.set(item.net.name, candidate);
      }
      const top: Candidate[] = [];
      for (const candidate of bestPerNet.values()) {
        const last = top[top.length - 1];
        if (top.length >= limit && last && byRank(candidate, last) >= 0) continue;
        let at = top.length;
        while (at > 0 && byRank(candidate, top[at - 1] as Candidate) < 0) at -= 1;
        top.splice(at, 0, candidate);
        if (top.length > limit) top.pop();
      }
      const matches = top.map((candidate): RailMatch => ({
        net: candidate.net,
        matchedAlias: candidate.alias,
        errors: candidate.errors,
      }));
      return matches;
    },
  };
}
