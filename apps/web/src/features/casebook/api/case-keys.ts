// Query keys of the casebook. Cases are not under the board's key (['boards', slug]): a vote or an
// edit re-ranks the lists of one board without making its nets and power tree stale, and a case's
// page is found by id alone.
export const casebookQueryKey = ['cases'] as const;

/** Every list of one board's cases: the case list, the rail panels and the duplicate suggestions. */
export function boardCasesQueryKey(slug: string) {
  return [...casebookQueryKey, 'board', slug] as const;
}

/** One case; its comments, confirmations, revisions and attachments sit under it. */
export function caseQueryKey(id: number) {
  return [...casebookQueryKey, 'case', id] as const;
}
