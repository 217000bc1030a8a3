// The casebook's words as the interface uses them. The lists repeat the contract's rather than
// importing them, whose module would bring the contract's validation code into the list and case
// pages for a few words; case-vocabulary.test.ts holds the two to the same values.
import type { CaseOutcome, CaseSort } from '@railyard/shared';

export const outcomesInOrder = [
  'solved',
  'partly',
  'not_solved',
] as const satisfies readonly CaseOutcome[];

export const outcomeLabel: Record<CaseOutcome, string> = {
  solved: 'solved',
  partly: 'partly solved',
  not_solved: 'not solved',
};

export const outcomeHint: Record<CaseOutcome, string> = {
  solved: 'the board works again',
  partly: 'some of the fault is fixed, some is not',
  not_solved: 'the fault is still there: what was tried helps the next person',
};

export const sortsInOrder = ['rank', 'relevance', 'newest'] as const satisfies readonly CaseSort[];

export const sortLabel: Record<CaseSort, string> = {
  rank: 'Best rated',
  relevance: 'Best match',
  newest: 'Newest',
};

/** The API's largest page (caseLimits.pageSize); the list asks for pages of this size. */
export const casesPerPage = 20;

/** Longest comment the API takes (caseLimits.comment). */
export const commentMaxLength = 10_000;

/** Longest note with a confirmation (caseLimits.confirmationNote). */
export const confirmationNoteMaxLength = 1000;

/** Longest search text (caseLimits.query). */
export const queryMaxLength = 200;
