// A case's moderation on its page: the banners everyone allowed to see the case reads (locked,
// hidden and why), and the moderator's panel to lock, hide, restore or merge it.
import type { CaseDetail } from '@railyard/shared';
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ReasonDialog } from '../../../components/ui/reason-dialog';
import { formatDateTime } from '../../../lib/date-format';
import { useModerateCase, type CaseModerationAction } from '../api/moderate-case';
import { MergeCaseDialog } from './merge-case-dialog';

export function CaseStateBanners({ detail }: { detail: CaseDetail }) {
  const state = detail.moderation;
  if (!state?.lockedAt && !state?.hiddenAt) return null;
  return (
    <div className="space-y-2 px-4 pt-3">
      {state.hiddenAt && (
        <div
          role="note"
          className="rounded-md border border-danger/45 bg-danger-soft px-3 py-2 text-[13px]"
        >
          <p>
            <strong className="font-semibold text-danger">Hidden</strong> by a moderator on{' '}
            <time dateTime={state.hiddenAt} className="font-mono tabular">
              {formatDateTime(state.hiddenAt)}
            </time>
            . Only moderators and the author see this case; it is left out of every list.
          </p>
          {state.hiddenReason && (
            <p className="mt-0.5 text-ink-muted">
              Reason: <span className="text-ink">{state.hiddenReason}</span>
            </p>
          )}
        </div>
      )}
      {state.lockedAt && (
        <p
          role="note"
          className="rounded-md border border-caution/45 bg-caution-soft px-3 py-2 text-[13px]"
        >
          <strong className="font-semibold text-caution">Locked</strong> by a moderator on{' '}
          <time dateTime={state.lockedAt} className="font-mono tabular">
            {formatDateTime(state.lockedAt)}
          </time>
          . It reads as before but takes no new comments, votes, confirmations or edits.
        </p>
      )}
    </div>
  );
}

type ActionText = {
  title: string;
  description: string;
  reasonLabel: string;
  placeholder: string;
  confirm: string;
  tone: 'primary' | 'danger';
};

const actionText: Record<CaseModerationAction, ActionText> = {
  lock: {
    title: 'Lock this case?',
    description:
      'It stays readable, but nobody can comment, vote, confirm or edit it until it is unlocked. Moderators can still change comments.',
    reasonLabel: 'Why you lock it',
    placeholder: 'e.g. the comments turned into an argument',
    confirm: 'Lock the case',
    tone: 'primary',
  },
  unlock: {
    title: 'Unlock this case?',
    description: 'Comments, votes, confirmations and the author’s edits are open again.',
    reasonLabel: 'Why you unlock it',
    placeholder: 'e.g. calmed down after a week',
    confirm: 'Unlock the case',
    tone: 'primary',
  },
  hide: {
    title: 'Hide this case?',
    description:
      'Only moderators and the author will see it, with your reason; it leaves the board’s lists, search and duplicate suggestions. Nothing is deleted.',
    reasonLabel: 'Why you hide it (the author reads this)',
    placeholder: 'e.g. copies a write-up from elsewhere word for word',
    confirm: 'Hide the case',
    tone: 'danger',
  },
  restore: {
    title: 'Restore this case?',
    description: 'Everyone sees it again, and it is back in the board’s lists and search.',
    reasonLabel: 'Why you restore it',
    placeholder: 'e.g. the author rewrote it in their own words',
    confirm: 'Restore the case',
    tone: 'primary',
  },
};

export function CaseModeratorPanel({ detail }: { detail: CaseDetail }) {
  const moderate = useModerateCase(detail.board.slug, detail.id);
  const [action, setAction] = useState<CaseModerationAction | null>(null);
  const [merging, setMerging] = useState(false);
  const locked = detail.moderation?.lockedAt != null;
  const hidden = detail.moderation?.hiddenAt != null;
  const shown = action ?? 'lock';
  const close = () => {
    setAction(null);
    moderate.reset();
  };

  return (
    <section
      aria-labelledby="case-moderation-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="case-moderation-title" className="text-sm font-semibold">
          Moderation
        </h2>
        <span className="text-xs text-ink-muted">
          {[locked ? 'locked' : null, hidden ? 'hidden' : null].filter(Boolean).join(', ') ||
            'not locked, not hidden'}
        </span>
      </header>
      <div className="flex flex-wrap gap-2 px-3 py-2.5">
        <Button size="sm" onClick={() => setAction(locked ? 'unlock' : 'lock')}>
          {locked ? 'Unlock case' : 'Lock case'}
        </Button>
        <Button size="sm" onClick={() => setAction(hidden ? 'restore' : 'hide')}>
          {hidden ? 'Restore case' : 'Hide case'}
        </Button>
        {detail.status === 'published' && (
          <Button size="sm" onClick={() => setMerging(true)}>
            Merge into another case…
          </Button>
        )}
      </div>
      <ReasonDialog
        open={action !== null}
        onClose={close}
        title={actionText[shown].title}
        description={actionText[shown].description}
        reasonLabel={actionText[shown].reasonLabel}
        placeholder={actionText[shown].placeholder}
        confirmLabel={actionText[shown].confirm}
        tone={actionText[shown].tone}
        pending={moderate.isPending}
        error={moderate.error}
        onConfirm={(reason) => moderate.mutate({ action: shown, reason }, { onSuccess: close })}
      />
      <MergeCaseDialog detail={detail} open={merging} onClose={() => setMerging(false)} />
    </section>
  );
}
