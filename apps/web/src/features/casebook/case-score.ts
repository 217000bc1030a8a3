// A case's score as the page shows it before the API has answered: a vote or a confirmation changes
// the counts at once, and the API's answer (or, on failure, the score from before) replaces it.
// The ranking figure is left as it was: the API computes it over people, counting someone who
// up-voted and confirmed once (packages/vote-ranking), which the counts alone cannot tell.
import type { CaseScore } from '@railyard/shared';

export type VoteValue = 1 | -1;

/** The score after the viewer's vote becomes `next` (null: the vote taken back). */
export function withVote(score: CaseScore, next: VoteValue | null): CaseScore {
  const before = score.myVote;
  if (before === next) return score;
  let { ups, downs } = score;
  if (before === 1) ups -= 1;
  if (before === -1) downs -= 1;
  if (next === 1) ups += 1;
  if (next === -1) downs += 1;
  return { ...score, ups: Math.max(0, ups), downs: Math.max(0, downs), myVote: next };
}

/** The score after the viewer confirmed ("this worked for me") or took the confirmation back. */
export function withConfirmation(score: CaseScore, confirmed: boolean): CaseScore {
  if (score.confirmedByMe === confirmed) return score;
  const confirmations = Math.max(0, score.confirmations + (confirmed ? 1 : -1));
  return { ...score, confirmations, confirmedByMe: confirmed };
}

/** What pressing a vote button does: pressing the vote already given takes it back. */
export function voteAfterPress(current: VoteValue | null, pressed: VoteValue): VoteValue | null {
  return current === pressed ? null : pressed;
}

/** The ranking bound as a share: "at least 44 % found it worked", with 95 % confidence. */
export function formatRankBound(bound: number): string {
  if (!Number.isFinite(bound) || bound <= 0) return '0 %';
  return `${Math.round(Math.min(1, bound) * 100)} %`;
}
