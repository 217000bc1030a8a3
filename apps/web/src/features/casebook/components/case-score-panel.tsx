// Peers judge the fix: an up- or down-vote on the write-up, and "this worked for me" from someone
// who followed it on their own board. Both show at once and are put back if the API refuses.
// Nobody votes on or confirms their own case, and drafts take neither.
import type { CaseDetail, SessionUser } from '@railyard/shared';
import { useState } from 'react';
import { useLocation } from 'react-router-dom';
import { buttonClass, Button } from '../../../components/ui/button';
import { TextArea } from '../../../components/ui/field';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/date-format';
import { formatCount } from '../../../lib/quantity-format';
import { useConfirmCase } from '../api/confirm-case';
import { useConfirmations } from '../api/get-confirmations';
import { useVoteOnCase } from '../api/vote-on-case';
import { formatRankBound, voteAfterPress, type VoteValue } from '../case-score';
import { confirmationNoteMaxLength } from '../case-vocabulary';
import { ConfirmGlyph, DownGlyph, PersonName, UpGlyph } from './case-marks';

/** Why the viewer cannot judge this case, or null when they can. */
function refusal(detail: CaseDetail, viewer: SessionUser | null | undefined): string | null {
  if (viewer === undefined) return 'Checking who is signed in…';
  if (viewer === null) return 'sign-in';
  if (viewer.id === detail.author.id) {
    return 'You wrote this case: votes and confirmations come from other technicians.';
  }
  if (detail.status !== 'published')
    return 'Votes and confirmations open once the case is published.';
  if (detail.moderation?.lockedAt) {
    return 'A moderator locked this case: votes and confirmations stay as they are.';
  }
  return null;
}

function SignInToJudge() {
  const { pathname, search } = useLocation();
  return (
    <p className="text-[13px] text-ink-muted">
      <a
        href={paths.signIn.getHref(`${pathname}${search}`)}
        className="text-accent hover:underline"
      >
        Sign in
      </a>{' '}
      to vote on this fix or to say it worked for you.
    </p>
  );
}

function VoteButton({
  value,
  count,
  mine,
  disabled,
  onPress,
}: {
  value: VoteValue;
  count: number;
  mine: boolean;
  disabled: boolean;
  onPress: () => void;
}) {
  const up = value === 1;
  const label = up ? 'The fix is good' : 'The fix is wrong or unclear';
  const on = up ? 'border-ok/60 bg-ok-soft text-ok' : 'border-danger/60 bg-danger-soft text-danger';
  return (
    <button
      type="button"
      aria-pressed={mine}
      aria-label={`${label}, ${count}${mine ? ', your vote (press again to take it back)' : ''}`}
      title={mine ? 'Your vote: press again to take it back' : label}
      disabled={disabled}
      onClick={onPress}
      className={`inline-flex h-8 min-w-[4.5rem] items-center justify-center gap-1.5 rounded-md border px-2.5 font-mono text-sm tabular transition-colors disabled:cursor-not-allowed disabled:opacity-55 ${
        mine ? on : 'border-line bg-raised text-ink hover:border-line-strong'
      }`}
    >
      {up ? <UpGlyph size={11} /> : <DownGlyph size={11} />}
      {formatCount(count)}
    </button>
  );
}

function Confirmations({ caseId, count }: { caseId: number; count: number }) {
  const [open, setOpen] = useState(false);
  const list = useConfirmations(caseId, open && count > 0);
  if (count === 0) return null;
  return (
    <div className="text-[13px]">
      <button
        type="button"
        aria-expanded={open}
        onClick={() => setOpen((current) => !current)}
        className="text-accent hover:underline"
      >
        {open ? 'Hide who confirmed it' : `Who confirmed it (${formatCount(count)})`}
      </button>
      {open && (
        <ul className="mt-1.5 space-y-1.5">
          {list.isPending && <li className="text-ink-muted">Loading…</li>}
          {list.isError && (
            <li className="text-danger">Could not load them: {list.error.message}</li>
          )}
          {list.data?.map((confirmation) => (
            <li key={confirmation.user.id} className="rounded bg-sunken/60 px-2 py-1">
              <div className="flex items-baseline gap-2">
                <PersonName person={confirmation.user} />
                <span className="ml-auto font-mono text-xs text-ink-faint">
                  {formatDateTime(confirmation.createdAt).slice(0, 10)}
                </span>
              </div>
              {confirmation.note && (
                <p className="mt-0.5 whitespace-pre-line text-ink-muted">{confirmation.note}</p>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

type CaseScorePanelProps = { detail: CaseDetail; viewer: SessionUser | null | undefined };

export function CaseScorePanel({ detail, viewer }: CaseScorePanelProps) {
  const slug = detail.board.slug;
  const vote = useVoteOnCase(slug, detail.id);
  const confirm = useConfirmCase(slug, detail.id);
  const [noteOpen, setNoteOpen] = useState(false);
  const [note, setNote] = useState('');
  const { score } = detail;
  const why = refusal(detail, viewer);
  const busy = vote.isPending || confirm.isPending;

  const press = (pressed: VoteValue) => vote.mutate(voteAfterPress(score.myVote, pressed));

  return (
    <section
      aria-labelledby="case-score-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="case-score-title" className="text-sm font-semibold">
          Did the fix hold?
        </h2>
        {score.ups + score.downs + score.confirmations === 0 ? (
          <span className="ml-auto text-xs text-ink-muted">not rated yet</span>
        ) : (
          <span
            className="ml-auto text-xs text-ink-muted"
            title="Lower bound of the Wilson score interval at 95 %: with 95 % confidence, at least this share of the people who judged it found the fix good (each person counted once)"
          >
            rated at least{' '}
            <span className="font-mono text-ink tabular">
              {formatRankBound(score.wilsonLowerBound)}
            </span>
          </span>
        )}
      </header>
      <div className="space-y-3 px-3 py-2.5">
        <div className="flex items-center gap-2">
          <VoteButton
            value={1}
            count={score.ups}
            mine={score.myVote === 1}
            disabled={why !== null || busy}
            onPress={() => press(1)}
          />
          <VoteButton
            value={-1}
            count={score.downs}
            mine={score.myVote === -1}
            disabled={why !== null || busy}
            onPress={() => press(-1)}
          />
          <span
            className={`ml-auto inline-flex items-center gap-1.5 text-[13px] ${score.confirmations > 0 ? 'text-ok' : 'text-ink-muted'}`}
          >
            <ConfirmGlyph size={13} />
            <span>
              <span className="font-mono tabular">{formatCount(score.confirmations)}</span>{' '}
              {score.confirmations === 1 ? 'says' : 'say'} it worked
            </span>
          </span>
        </div>

        {why === 'sign-in' ? (
          <SignInToJudge />
        ) : why !== null ? (
          <p className="text-[13px] text-ink-muted">{why}</p>
        ) : score.confirmedByMe ? (
          <div className="flex flex-wrap items-center gap-2 text-[13px]">
            <span className="inline-flex items-center gap-1.5 text-ok">
              <ConfirmGlyph /> You said this worked for you.
            </span>
            <Button
              size="sm"
              variant="ghost"
              disabled={busy}
              onClick={() => confirm.mutate({ confirmed: false })}
            >
              Take it back
            </Button>
          </div>
        ) : noteOpen ? (
          <form
            className="space-y-2"
            onSubmit={(event) => {
              event.preventDefault();
              confirm.mutate(
                { confirmed: true, note: note.trim() },
                {
                  onSuccess: () => {
                    setNoteOpen(false);
                    setNote('');
                  },
                },
              );
            }}
          >
            <label htmlFor="confirmation-note" className="text-[13px] font-medium">
              What was the same, or different, on your board?{' '}
              <span className="font-normal text-ink-faint">optional</span>
            </label>
            <TextArea
              id="confirmation-note"
              rows={2}
              maxLength={confirmationNoteMaxLength}
              value={note}
              placeholder="e.g. same readings; the culprit sat one position over, C4006"
              onChange={(event) => setNote(event.target.value)}
            />
            <div className="flex gap-2">
              <Button type="submit" size="sm" variant="primary" disabled={busy}>
                It worked for me
              </Button>
              <Button size="sm" variant="ghost" onClick={() => setNoteOpen(false)}>
                Cancel
              </Button>
            </div>
          </form>
        ) : (
          <button
            type="button"
            disabled={busy}
            onClick={() => setNoteOpen(true)}
            className={`${buttonClass('secondary', 'sm')} w-full`}
          >
            <ConfirmGlyph /> This worked for me
          </button>
        )}

        {(vote.isError || confirm.isError) && (
          <p role="alert" className="text-[13px] text-danger">
            Not saved, your {vote.isError ? 'vote' : 'confirmation'} is back as it was:{' '}
            {(vote.error ?? confirm.error)?.message}
          </p>
        )}
        <Confirmations caseId={detail.id} count={score.confirmations} />
      </div>
    </section>
  );
}
