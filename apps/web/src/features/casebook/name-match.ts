// Finding a net or a part by a few typed characters in the editor's pickers. Case and separators do
// not matter ("vcc 3v3" finds VCC_3V3); names that start with the text come before names that only
// contain it, and shorter names first, so "C1" offers C1 before C10 and C1013.
import { naturalCompare } from '../../lib/natural-order';

/** Upper case without separators: the form names are compared in. */
export function nameKey(name: string): string {
  return name.toUpperCase().replace(/[^A-Z0-9+#]/g, '');
}

export type NameOption = { name: string; aliases?: readonly string[] };

/** Up to `limit` options matching `text`, best first; none for blank text. */
export function matchNames<T extends NameOption>(
  options: readonly T[],
  text: string,
  limit: number,
) {
  const key = nameKey(text);
  if (key === '') return [];
  const ranked: { option: T; rank: number }[] = [];
  for (const option of options) {
    let rank = Number.POSITIVE_INFINITY;
    for (const [index, name] of [option.name, ...(option.aliases ?? [])].entries()) {
      const candidate = nameKey(name);
      const at = candidate.indexOf(key);
      if (at < 0) continue;
      // exact, then prefix, then anywhere; an alias match ranks just after the same match by name
      const place = candidate === key ? 0 : at === 0 ? 1 : 2;
      rank = Math.min(rank, place * 2 + (index === 0 ? 0 : 1));
    }
    if (rank !== Number.POSITIVE_INFINITY) ranked.push({ option, rank });
  }
  ranked.sort(
    (a, b) =>
      a.rank - b.rank ||
      a.option.name.length - b.option.name.length ||
      naturalCompare(a.option.name, b.option.name),
  );
  return ranked.slice(0, limit).map((entry) => entry.option);
}
