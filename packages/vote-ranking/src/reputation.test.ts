import { describe, expect, it } from 'vitest';
import { reputation, reputationWeights } from './reputation';

// Railyard's own rule (reputation.ts, docs/api.md): +10 per up-vote, −2 per down-vote, +5 per
// confirmation received on published cases, floor 0. No outside source: these tests pin the rule.
describe('reputation from votes received', () => {
  it('adds 10 per up-vote and 5 per confirmation and takes 2 per down-vote', () => {
    expect(reputation({ upvotes: 3, downvotes: 2, confirmations: 4 })).toBe(3 * 10 - 2 * 2 + 4 * 5);
    expect(reputationWeights).toEqual({ upvote: 10, downvote: -2, confirmation: 5 });
  });

  it('starts at 0 for someone nobody has voted on', () => {
    expect(reputation({ upvotes: 0, downvotes: 0, confirmations: 0 })).toBe(0);
  });

  it('never goes below 0, however many down-votes', () => {
    expect(reputation({ upvotes: 1, downvotes: 40, confirmations: 0 })).toBe(0);
  });

  it('needs five down-votes to cancel one up-vote', () => {
    expect(reputation({ upvotes: 1, downvotes: 5, confirmations: 0 })).toBe(0);
    expect(reputation({ upvotes: 1, downvotes: 4, confirmations: 0 })).toBe(2);
  });

  it('refuses negative or fractional counts, naming the count', () => {
    expect(() => reputation({ upvotes: -1, downvotes: 0, confirmations: 0 })).toThrow(/upvotes must be a whole number/);
    expect(() => reputation({ upvotes: 0, downvotes: 0, confirmations: 1.5 })).toThrow(/confirmations must be a whole number/);
  });
});
