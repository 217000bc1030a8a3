// A technician's reputation, from what others did with their published cases. Railyard's own rule:
// an up-vote is worth 10, a confirmation ("this worked for me") 5 on top of any vote, a down-vote
// costs 2, and the total never goes below 0. Down-votes cost little so that writing up an unsolved or
// partly solved repair, which helps the next person too, is never a losing move. Votes and
// confirmations on one's own cases cannot exist (the API refuses them), so they need no rule here.

export const reputationWeights = { upvote: 10, downvote: -2, confirmation: 5 } as const;

export interface ReceivedVotes {
  upvotes: number;
  downvotes: number;
  confirmations: number;
}

export function reputation(received: ReceivedVotes): number {
  for (const [name, value] of Object.entries(received)) {
    if (!Number.isInteger(value) || value < 0) throw new RangeError(`${name} must be a whole number ≥ 0, got ${value}`);
  }
  const total =
    reputationWeights.upvote * received.upvotes +
    reputationWeights.downvote * received.downvotes +
    reputationWeights.confirmation * received.confirmations;
  return Math.max(0, total);
}
