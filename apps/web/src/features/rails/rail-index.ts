// Finds a rail on one board from what a technician typed: "3v3", "vcc 3v3", "VCC-3V3" and a slip
// such as "vcc_3v4" all lead to VCC_3V3. Names and aliases are folded the same way as the query,
// then matched by edit distance anywhere in the name (approximate substring matching, Sellers 1980).
//
// Every keystroke searches the whole board, so the matching is done in two cheap steps: a filter
// that drops names which cannot be within the error budget, then the exact distance for the rest by
// Myers' bit-vector algorithm. On a 5,000-net board a fuzzy-search library spent 5–15 ms a keystroke.
import type { NetKind, NetRow } from '@railyard/shared';
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

/** Errors allowed for a folded query of this length: at most the threshold's share of it. */
function errorBudget(length: number): number {
  return Math.floor(railMatchThreshold * length);
}

/**
 * The query cut into `budget + 1` pieces of near-equal length. With at most `budget` edits some
 * piece is left untouched, so a name that contains none of the pieces cannot match (the pigeonhole
 * filter of Wu & Manber, "Fast text searching allowing errors", CACM 35(10), 1992).
 */
function filterPieces(needle: string, budget: number): string[] {
  const count = budget + 1;
  const pieces: string[] = [];
  for (let i = 0; i < count; i++) {
    pieces.push(
      needle.slice(
        Math.floor((i * needle.length) / count),
        Math.floor(((i + 1) * needle.length) / count),
      ),
    );
  }
  return pieces;
}

/** The fewest edits that turn `needle` into some substring of a text; texts are scanned one by one. */
type SubstringDistance = (text: string) => number;

/**
 * G. Myers, "A fast bit-vector algorithm for approximate string matching based on dynamic
 * programming", J. ACM 46(3), 1999: one column of the Sellers table per text character, held as
 * bit vectors of its vertical deltas. The start of the match is free, so the top row stays zero.
 */
function bitVectorDistance(needle: string): SubstringDistance {
  const length = needle.length;
  const ascii = new Int32Array(128);
  const other = new Map<number, number>();
  for (let i = 0; i < length; i++) {
    const code = needle.charCodeAt(i);
    if (code < 128) ascii[code] = (ascii[code] ?? 0) | (1 << i);
    else other.set(code, (other.get(code) ?? 0) | (1 << i));
  }
  const last = 1 << (length - 1);
  return (text) => {
    // All ones: bits above the needle's rows are never read, and sums only carry upward.
    let plus = -1;
    let minus = 0;
    let score = length;
    let best = length;
    for (let j = 0; j < text.length && best > 0; j++) {
      const code = text.charCodeAt(j);
      const equal = code < 128 ? (ascii[code] ?? 0) : (other.get(code) ?? 0);
      const vertical = equal | minus;
      const horizontal = (((equal & plus) + plus) ^ plus) | equal;
      let up = minus | ~(horizontal | plus);
      let down = plus & horizontal;
      if (up & last) score += 1;
      else if (down & last) score -= 1;
      up <<= 1;
      down <<= 1;
      plus = down | ~(vertical | up);
      minus = up & vertical;
      if (score < best) best = score;
    }
    return best;
  };
}

/** The Sellers table itself, one column at a time, for queries longer than a 32-bit word. */
function tableDistance(needle: string): SubstringDistance {
  const column = new Int32Array(needle.length + 1);
  return (text) => {
    for (let i = 0; i <= needle.length; i++) column[i] = i;
    let best = needle.length;
    for (let j = 0; j < text.length; j++) {
      let diagonal = 0;
      for (let i = 1; i <= needle.length; i++) {
        const above = column[i] ?? 0;
        const substitution = diagonal + (needle[i - 1] === text[j] ? 0 : 1);
        column[i] = Math.min(above + 1, (column[i - 1] ?? 0) + 1, substitution);
        diagonal = above;
      }
      best = Math.min(best, column[needle.length] ?? 0);
    }
    return best;
  };
}

const kindRank: Record<NetKind, number> = { power: 0, ground: 1, signal: 2 };

type RailRecord = {
  /** folded printed name or alias: the text searched */
  key: string;
  /** the alias this record stands for; null for the printed name */
  alias: string | null;
  /** the parts of its rank that do not depend on the query (see `rankOf`) */
  fixedRank: number;
};

type NetEntry = { net: NetRow; records: RailRecord[] };

type Ranked = { rank: number; net: NetRow; alias: string | null; errors: number };

/**
 * Fewest errors first; among equals, the name typed in full, then a name that starts with the
 * text, then rails before signals, the printed name before an alias, and the shortest name
 * (VCC_3V3 before VCC_3V3_SENSOR); natural order of the names breaks what is still tied. All but
 * the last fit one number, so ranking thousands of hits is number comparisons.
 */
function rankOf(errors: number, whole: boolean, prefix: boolean, fixedRank: number): number {
  return ((errors * 2 + (whole ? 0 : 1)) * 2 + (prefix ? 0 : 1)) * 6144 + fixedRank;
}

function fixedRankOf(kind: NetKind, alias: string | null, key: string): number {
  // 3 kinds × 2 × 1024 = 6144; folded names are at most a few hundred characters
  return (kindRank[kind] * 2 + (alias === null ? 0 : 1)) * 1024 + Math.min(key.length, 1023);
}

function before(a: Ranked, b: Ranked): boolean {
  return a.rank < b.rank || (a.rank === b.rank && naturalCompare(a.net.name, b.net.name) < 0);
}

export function buildRailIndex(nets: readonly NetRow[]): RailIndex {
  const entries: NetEntry[] = nets.map((net) => {
    // normalizedName is folded again: the API keeps marks (a trailing `-`) that the query loses.
    const texts = [
      { key: normalizeRailText(net.normalizedName || net.name), alias: null },
      ...net.aliases.map((alias) => ({ key: normalizeRailText(alias), alias })),
    ];
    const records = texts
      .filter(({ key }) => key !== '')
      .map(({ key, alias }) => ({ key, alias, fixedRank: fixedRankOf(net.kind, alias, key) }));
    return { net, records };
  });

  return {
    size: nets.length,
    search(query, limit = 8) {
      const needle = normalizeRailText(query);
      if (needle === '' || limit <= 0) return [];
      const budget = errorBudget(needle.length);
      const pieces = filterPieces(needle, budget);
      const distance = needle.length <= 32 ? bitVectorDistance(needle) : tableDistance(needle);
      // The best `limit` nets by insertion into a short sorted list: a one-letter query matches
      // thousands of names, and sorting them all costs more than the search itself.
      const top: Ranked[] = [];
      for (const { net, records } of entries) {
        // the net's best record: its name or one of its aliases
        let rank = Infinity;
        let alias: string | null = null;
        let errors = 0;
        for (const record of records) {
          const { key } = record;
          let found: number;
          if (budget === 0) {
            if (!key.includes(needle)) continue;
            found = 0;
          } else {
            let hopeful = false;
            for (const piece of pieces) if ((hopeful = key.includes(piece))) break;
            if (!hopeful) continue;
            found = distance(key);
            if (found > budget) continue;
          }
          const recordRank = rankOf(
            found,
            key === needle,
            key.startsWith(needle),
            record.fixedRank,
          );
          if (recordRank < rank) {
            rank = recordRank;
            alias = record.alias;
            errors = found;
          }
        }
        if (rank === Infinity) continue;
        const candidate: Ranked = { rank, net, alias, errors };
        const last = top[top.length - 1];
        if (top.length >= limit && last && !before(candidate, last)) continue;
        let at = top.length;
        while (at > 0 && before(candidate, top[at - 1] as Ranked)) at -= 1;
        top.splice(at, 0, candidate);
        if (top.length > limit) top.pop();
      }
      return top.map(({ net, alias, errors }) => ({ net, matchedAlias: alias, errors }));
    },
  };
}
