import type { CaseScore } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { formatRankBound, voteAfterPress, withConfirmation, withVote } from './case-score';

const score = (overrides: Partial<CaseScore> = {}): CaseScore => ({
  ups: 3,
  downs: 1,
  confirmations: 2,
  wilsonLowerBound: 0.3,
  myVote: null,
  confirmedByMe: false,
  ...overrides,
});

// The contract (packages/shared/src/casebook.ts) allows one vote per person, 1 or −1; changing it
// replaces the old one. Each check below counts the votes by hand.
describe('score shown before the API answers', () => {
  it('adds an up-vote from someone who had not voted', () => {
    expect(withVote(score(), 1)).toMatchObject({ ups: 4, downs: 1, myVote: 1 });
  });

  it('moves a changed vote from one side to the other', () => {
    expect(withVote(score({ myVote: 1 }), -1)).toMatchObject({ ups: 2, downs: 2, myVote: -1 });
  });

  it('takes a vote back', () => {
    expect(withVote(score({ myVote: -1 }), null)).toMatchObject({ ups: 3, downs: 0, myVote: null });
  });

  it('leaves the score alone when the vote does not change', () => {
    const before = score({ myVote: 1 });
    expect(withVote(before, 1)).toBe(before);
  });

  it('keeps the ranking bound until the API sends its own', () => {
    expect(withVote(score(), 1).wilsonLowerBound).toBe(0.3);
  });

  it('counts a confirmation once and takes it back', () => {
    const confirmed = withConfirmation(score(), true);
    expect(confirmed).toMatchObject({ confirmations: 3, confirmedByMe: true });
    expect(withConfirmation(confirmed, true)).toBe(confirmed);
    expect(withConfirmation(confirmed, false)).toMatchObject({
      confirmations: 2,
      confirmedByMe: false,
    });
  });

  it('takes the vote back when the button of the vote already given is pressed', () => {
    expect(voteAfterPress(1, 1)).toBeNull();
    expect(voteAfterPress(1, -1)).toBe(-1);
    expect(voteAfterPress(null, 1)).toBe(1);
  });

  it('writes the ranking bound as a whole percentage', () => {
    // shared/reference/FACTS.md §6 [calc]: 3 up, 0 down gives a Wilson lower bound of 0.438503
    expect(formatRankBound(0.438503)).toBe('44 %');
    expect(formatRankBound(0)).toBe('0 %');
  });
});
