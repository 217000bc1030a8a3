// Finds a rail on one board from what a technician typed: "3v3", "vcc 3v3", "VCC-3V3" and a slip
// such as "vcc_3v4" all lead to VCC_3V3. Names and aliases are folded the same way as the query,
// then matched by edit distance anywhere in the name (fuse.js's Bitap search with location off).
// Most keystrokes are part of a name typed without a slip: when the folded text appears as it is in
// enough names to fill the list, those exact hits are the answer (they rank above any fuzzy match)
// and fuse.js is not asked; otherwise it is asked only about the names a q-gram count leaves, which
// keeps a 5,000-net board under 5 ms a keystroke.
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

/** The two-character pieces of `key`, each once. */
function bigramsOf(key: string): Set<string> {
  const grams = new Set<string>();
  for (let i = 0; i + 2 <= key.length; i++) grams.add(key.slice(i, i + 2));
  return grams;
}

/**
 * Records holding enough of the needle's two-character pieces to be within `errors` of it.
 * The q-gram lemma (E. Ukkonen, "Approximate string-matching with q-grams and maximal matches",
 * Theoretical Computer Science 92, 1992): text within k edits of a pattern of length m holds at least
 * m + 1 − (k + 1)·q of the pattern's q-grams, counted by position. Null when that bound says nothing.
 */
function bigramCandidates(
  needle: string,
  errors: number,
  postings: ReadonlyMap<string, readonly number[]>,
  counts: Uint16Array,
): number[] | null {
  const needed = needle.length + 1 - (errors + 1) * 2;
  if (needed <= 0) return null;
  const perGram = new Map<string, number>();
  for (let i = 0; i + 2 <= needle.length; i++) {
    const gram = needle.slice(i, i + 2);
    perGram.set(gram, (perGram.get(gram) ?? 0) + 1);
  }
  const touched: number[] = [];
  for (const [gram, times] of perGram) {
    for (const record of postings.get(gram) ?? []) {
      if (counts[record] === 0) touched.push(record);
      counts[record] = (counts[record] ?? 0) + times;
    }
  }
  const passing = touched.filter((record) => (counts[record] ?? 0) >= needed);
  for (const record of touched) counts[record] = 0;
  return passing;
}

/** How often each character occurs in each record: one row of `columns.size` counts per record. */
type CharacterTable = { columns: ReadonlyMap<string, number>; counts: Uint8Array };

function characterTable(keys: readonly string[]): CharacterTable {
  const columns = new Map<string, number>();
  for (const key of keys)
    for (const char of key) if (!columns.has(char)) columns.set(char, columns.size);
  const counts = new Uint8Array(keys.length * columns.size);
  keys.forEach((key, at) => {
    for (const char of key) {
      const cell = at * columns.size + (columns.get(char) as number);
      counts[cell] = Math.min(255, (counts[cell] ?? 0) + 1);
    }
  });
  return { columns, counts };
}

/**
 * A test for the q-gram lemma with q = 1: text within k edits of a pattern of length m holds at least
 * m − k of the pattern's characters (each edit costs the pattern at most one of them), counted as a
 * multiset. For the short texts typed here it is the strongest of the three filters: "VDDMEM" with
 * k = 2 asks for 4 of its six characters, while the two-character bound asks for one piece.
 */
function holdsEnoughCharacters(needle: string, errors: number, table: CharacterTable) {
  const wanted = new Map<number, number>();
  for (const char of needle) {
    const column = table.columns.get(char);
    if (column !== undefined) wanted.set(column, (wanted.get(column) ?? 0) + 1);
  }
  const needed = needle.length - errors;
  const width = table.columns.size;
  return (record: number) => {
    let held = 0;
    for (const [column, times] of wanted)
      held += Math.min(times, table.counts[record * width + column] ?? 0);
    return held >= needed;
  };
}

/**
 * `count` consecutive pieces of `text` for the pigeonhole filter. Any cut works; the one chosen makes
 * the pieces rare in the board's names (`howMany` estimates how many names hold a piece), since one
 * common piece — a lone `V` — lets nearly every name through. Even pieces when there are too many
 * cuts to weigh.
 */
function splitIntoPieces(
  text: string,
  count: number,
  howMany: (piece: string) => number,
): string[] {
  const even = () => {
    const pieces: string[] = [];
    const size = text.length / count;
    for (let i = 0; i < count; i++)
      pieces.push(text.slice(Math.round(i * size), Math.round((i + 1) * size)));
    return pieces.filter((piece) => piece !== '');
  };
  if (count <= 1 || text.length > 12) return even();
  let best: string[] = even();
  let bestCost = best.reduce((sum, piece) => sum + howMany(piece), 0);
  // every choice of count − 1 cut points among the text.length − 1 gaps
  const cuts: number[] = [];
  const visit = (from: number) => {
    if (cuts.length === count - 1) {
      const ends = [0, ...cuts, text.length];
      const pieces = ends.slice(1).map((end, at) => text.slice(ends[at], end));
      const cost = pieces.reduce((sum, piece) => sum + howMany(piece), 0);
      if (cost < bestCost) [best, bestCost] = [pieces, cost];
      return;
    }
    for (let cut = from; cut <= text.length - (count - 1 - cuts.length); cut++) {
      cuts.push(cut);
      visit(cut + 1);
      cuts.pop();
    }
  };
  visit(1);
  return best;
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
  // which records hold each two-character piece, for the q-gram filter
  const postings = new Map<string, number[]>();
  records.forEach((record, at) => {
    for (const gram of bigramsOf(record.key)) {
      const list = postings.get(gram);
      if (list) list.push(at);
      else postings.set(gram, [at]);
    }
  });
  const gramCounts = new Uint16Array(records.length);
  const characters = characterTable(records.map((record) => record.key));
  const charCounts = new Map<string, number>();
  for (const record of records) {
    for (const char of new Set(record.key)) charCounts.set(char, (charCounts.get(char) ?? 0) + 1);
  }
  // at most the names holding the piece's rarest character or two-character piece
  const howMany = (piece: string) => {
    let fewest = Math.min(...[...piece].map((char) => charCounts.get(char) ?? 0));
    for (let i = 0; i + 2 <= piece.length; i++)
      fewest = Math.min(fewest, postings.get(piece.slice(i, i + 2))?.length ?? 0);
    return fewest;
  };

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
        // Only names that can be within the error budget go to fuse.js, so it scores tens of names
        // instead of thousands: those holding enough of the text's two-character pieces (q-gram
        // lemma, when the text is long enough for that bound to say something), one of k + 1
        // pieces of it unchanged (pigeonhole: k errors cannot touch all k + 1), and enough of its
        // characters (the same lemma for single characters). Each is necessary, so none loses a match.
        const budget = Math.floor(railMatchThreshold * needle.length);
        const byGrams = bigramCandidates(needle, budget, postings, gramCounts);
        const pieces = splitIntoPieces(needle, budget + 1, howMany);
        const holdsPiece = (at: number) =>
          pieces.some((piece) => (records[at] as RailRecord).key.includes(piece));
        const enoughCharacters = holdsEnoughCharacters(needle, budget, characters);
        const candidates = (byGrams ?? records.map((_record, at) => at))
          .filter((at) => holdsPiece(at) && enoughCharacters(at))
          .map((at) => records[at] as RailRecord);
        // building a fuse.js index for most of the board costs more than searching the whole one
        hits =
          candidates.length * 2 > records.length
            ? fuse.search(needle)
            : new Fuse(candidates, fuseOptions).search(needle);
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
