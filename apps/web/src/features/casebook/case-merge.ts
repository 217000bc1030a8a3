// Merged cases as the pages treat them. A duplicate folded into another case keeps its id, and the
// API answers that id with the kept case: the page then moves to the kept case's own address and
// says where the reader came from. The merge dialog picks the kept case among the board's cases.
import type { CaseDetail, CaseMergeCounts, CaseMergeSummary, CaseSummary } from '@railyard/shared';
import { paths } from '../../config/paths';
import { mergedRowKinds } from '../../lib/merged-rows';

/** The search parameter that carries the duplicate's id to the kept case's page. */
const mergedFromParam = 'mergedFrom';

/**
 * Where the page for `requestedId` should go instead: the kept case's address, when the API
 * answered with another case (the requested one was merged into it); null when it is the case asked for.
 */
export function mergedRedirectHref(
  requestedId: number,
  shown: Pick<CaseDetail, 'id'>,
): string | null {
  if (shown.id === requestedId) return null;
  const search = new URLSearchParams({ [mergedFromParam]: String(requestedId) });
  return `${paths.case.getHref(shown.id)}?${search.toString()}`;
}

export type MergedNotice = { id: number; title: string | null };

/**
 * The duplicate the reader was sent here from, read from the address. Only an id this case lists as
 * merged into it is believed (with its title); a hand-made or stale link shows no notice.
 */
export function mergedNoticeOf(
  search: URLSearchParams,
  shown: Pick<CaseDetail, 'id' | 'mergedFrom'>,
): MergedNotice | null {
  const raw = search.get(mergedFromParam);
  if (raw === null || !/^\d{1,10}$/.test(raw)) return null;
  const id = Number(raw);
  if (id === shown.id) return null;
  const known = shown.mergedFrom?.find((merged) => merged.id === id);
  return known ? { id, title: known.title } : null;
}

/** A case number typed as "12" or "#12", for a moderator who knows which case to keep. */
export function caseNumberIn(query: string): number | null {
  const match = /^#?\s*(\d{1,10})$/.exec(query.trim());
  if (!match?.[1]) return null;
  const id = Number(match[1]);
  return id > 0 && id <= 2_147_483_647 ? id : null;
}

/**
 * The cases a duplicate may be merged into, from several lists (a typed case number, search
 * results, similar cases), first list first: each case once, never the duplicate itself, and only
 * cases of the duplicate's board.
 */
export function mergeCandidates<T extends Pick<CaseSummary, 'id' | 'board'>>(
  duplicate: Pick<CaseSummary, 'id' | 'board'>,
  lists: ReadonlyArray<readonly T[] | undefined>,
): T[] {
  const seen = new Set<number>([duplicate.id]);
  const candidates: T[] = [];
  for (const list of lists) {
    for (const found of list ?? []) {
      if (seen.has(found.id) || found.board.slug !== duplicate.board.slug) continue;
      seen.add(found.id);
      candidates.push(found);
    }
  }
  return candidates;
}

/** What the merge dialog hands to the kept case's page, in the history entry's state. */
export type MergeOutcome = { summary: CaseMergeSummary; fromTitle: string };

export function mergeOutcomeState(outcome: MergeOutcome): { merged: MergeOutcome } {
  return { merged: outcome };
}

const isCounts = (value: unknown): value is CaseMergeCounts =>
  typeof value === 'object' &&
  value !== null &&
  mergedRowKinds.every((kind) => typeof (value as Record<string, unknown>)[kind] === 'number');

/**
 * The merge just done into `shownId`, from the history entry's state; null for any other entry
 * (state survives reloads and may come from an older version of the page, so it is checked).
 */
export function mergeOutcomeFrom(state: unknown, shownId: number): MergeOutcome | null {
  const merged = (state as { merged?: unknown } | null | undefined)?.merged;
  if (typeof merged !== 'object' || merged === null) return null;
  const { summary, fromTitle } = merged as { summary?: unknown; fromTitle?: unknown };
  if (typeof summary !== 'object' || summary === null || typeof fromTitle !== 'string') return null;
  const s = summary as Record<string, unknown>;
  if (s.intoCaseId !== shownId || typeof s.fromCaseId !== 'number' || typeof s.auditId !== 'number')
    return null;
  if (!isCounts(s.moved) || !isCounts(s.keptOnDuplicate)) return null;
  return { summary: summary as CaseMergeSummary, fromTitle };
}
