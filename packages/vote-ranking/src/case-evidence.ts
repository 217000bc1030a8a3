// What a case's votes and confirmations say, as the Wilson bound sees it. The interval models
// independent yes/no trials, so each person is one trial: positive when they up-voted or confirmed
// ("this worked for me") or both, negative when they down-voted and did not confirm. A confirmation
// outweighs the same person's down-vote, because it reports the fix working on a real board, while a
// down-vote may judge the write-up. A person who up-votes and confirms counts once, not twice.
import { wilsonLowerBound } from './wilson-score';

export interface CaseVote {
  userId: number;
  value: 1 | -1;
}

export interface CaseEvidence {
  /** shown counts */
  ups: number;
  downs: number;
  confirmations: number;
  /** people counted by the ranking */
  positive: number;
  negative: number;
}

export function caseEvidence(votes: readonly CaseVote[], confirmedBy: readonly number[]): CaseEvidence {
  const confirmers = new Set(confirmedBy);
  const voters = new Map<number, 1 | -1>();
  for (const vote of votes) {
    if (voters.has(vote.userId)) throw new Error(`user ${vote.userId} has two votes on one case`);
    voters.set(vote.userId, vote.value);
  }
  const positive = new Set(confirmers);
  let negative = 0;
  for (const [userId, value] of voters) {
    if (value === 1) positive.add(userId);
    else if (!confirmers.has(userId)) negative += 1;
  }
  const values = [...voters.values()];
  return {
    ups: values.filter((v) => v === 1).length,
    downs: values.filter((v) => v === -1).length,
    confirmations: confirmers.size,
    positive: positive.size,
    negative,
  };
}

/** The number cases are ranked by: the Wilson lower bound (95 %) over the people counted. */
export function caseRankScore(evidence: Pick<CaseEvidence, 'positive' | 'negative'>): number {
  return wilsonLowerBound(evidence.positive, evidence.negative);
}
