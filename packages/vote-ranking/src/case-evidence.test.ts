import wilson from 'wilson-score';
import { describe, expect, it } from 'vitest';
import { caseEvidence, caseRankScore } from './case-evidence';
import { wilsonLowerBound, z95 } from './wilson-score';

describe('case evidence for the ranking', () => {
  it('counts a confirmation from someone who did not vote as one more positive person', () => {
    const evidence = caseEvidence(
      [
        { userId: 1, value: 1 },
        { userId: 2, value: 1 },
        { userId: 3, value: -1 },
      ],
      [4, 5],
    );
    expect(evidence).toEqual({ ups: 2, downs: 1, confirmations: 2, positive: 4, negative: 1 });
    // cross-check with wilson-score (npm): 4 positive of 5 people, two-sided 95 % z
    expect(caseRankScore(evidence)).toBeCloseTo(wilson(4, 5, z95), 12);
  });

  it('counts a person who up-voted and confirmed once', () => {
    const evidence = caseEvidence([{ userId: 1, value: 1 }], [1]);
    expect(evidence).toMatchObject({ ups: 1, confirmations: 1, positive: 1, negative: 0 });
    // FACTS.md §6 check value for 1 up, 0 down [calc]
    expect(caseRankScore(evidence)).toBeCloseTo(0.206549, 6);
  });

  it("lets a person's confirmation outweigh their own down-vote", () => {
    const evidence = caseEvidence([{ userId: 7, value: -1 }], [7]);
    expect(evidence).toEqual({ ups: 0, downs: 1, confirmations: 1, positive: 1, negative: 0 });
  });

  it('ranks by the Wilson bound of the people counted, so confirmations lift a case', () => {
    const votes = [
      { userId: 1, value: 1 as const },
      { userId: 2, value: -1 as const },
    ];
    const without = caseRankScore(caseEvidence(votes, []));
    const withConfirmations = caseRankScore(caseEvidence(votes, [3, 4, 5]));
    expect(without).toBeCloseTo(wilsonLowerBound(1, 1), 12);
    expect(withConfirmations).toBeCloseTo(wilsonLowerBound(4, 1), 12);
    expect(withConfirmations).toBeGreaterThan(without);
  });

  it('refuses two votes of one person on one case', () => {
    expect(() =>
      caseEvidence(
        [
          { userId: 1, value: 1 },
          { userId: 1, value: -1 },
        ],
        [],
      ),
    ).toThrow(/user 1 has two votes/);
  });
});
