// What a case merge moved, in words. The kept case's notice reads the counts the merge answered with,
// the audit log reads the row ids the merge entry records; both must name the rows alike.
import type { CaseMergeCounts } from '@railyard/shared';

const rowWords = {
  nets: ['net link', 'net links'],
  components: ['part link', 'part links'],
  readings: ['reading', 'readings'],
  attachments: ['photo or file', 'photos and files'],
  comments: ['comment', 'comments'],
  confirmations: ['confirmation', 'confirmations'],
  votes: ['vote', 'votes'],
} satisfies Record<keyof CaseMergeCounts, [one: string, many: string]>;

/** The kinds of rows a merge moves. */
export const mergedRowKinds = Object.keys(rowWords) as Array<keyof CaseMergeCounts>;

// A kind added by the API before this client knows it is still counted, under the API's name.
const wordsFor = (kind: string): [one: string, many: string] =>
  (rowWords as Record<string, [string, string] | undefined>)[kind] ?? [kind, kind];

/**
 * "3 readings, 1 comment, 2 votes", in the order the value lists the kinds, from counts or from
 * lists of row ids. Kinds with none are left out; "nothing" when all are, or the value is no record.
 */
export function mergedRowsText(value: unknown): string {
  const kinds = typeof value === 'object' && value !== null && !Array.isArray(value) ? value : {};
  const parts = Object.entries(kinds).flatMap(([kind, rows]: [string, unknown]) => {
    const count = Array.isArray(rows) ? rows.length : typeof rows === 'number' ? rows : 0;
    if (count === 0) return [];
    const [one, many] = wordsFor(kind);
    return [`${count.toLocaleString('en')} ${count === 1 ? one : many}`];
  });
  return parts.length === 0 ? 'nothing' : parts.join(', ');
}
