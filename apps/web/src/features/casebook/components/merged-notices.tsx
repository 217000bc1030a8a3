// What a kept case says about the duplicates folded into it: to a reader who followed an old link
// ("case #12 was merged into this one"), to the moderator who just merged (what moved), and to
// everyone, a short line naming the merged cases.
import type { CaseDetail } from '@railyard/shared';
import { useState } from 'react';
import { Link, useLocation, useSearchParams } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { mergedRowsText } from '../../../lib/merged-rows';
import {
  mergedNoticeOf,
  mergeOutcomeFrom,
  type MergedNotice,
  type MergeOutcome,
} from '../case-merge';

function JustMerged({ outcome, onDismiss }: { outcome: MergeOutcome; onDismiss: () => void }) {
  const { summary } = outcome;
  const leftBehind = mergedRowsText(summary.keptOnDuplicate);
  return (
    <div
      role="status"
      className="flex items-start gap-3 rounded-md border border-ok/40 bg-ok-soft px-3 py-2 text-[13px]"
    >
      <div className="min-w-0 flex-1">
        <p>
          Merged case <span className="font-mono">#{summary.fromCaseId}</span> “{outcome.fromTitle}”
          into this one. Moved here: {mergedRowsText(summary.moved)}.
        </p>
        {leftBehind !== 'nothing' && (
          <p className="mt-0.5 text-ink-muted">
            Left on the duplicate, because this case already had their like: {leftBehind}.
          </p>
        )}
        <p className="mt-0.5 text-ink-muted">
          An admin can undo it from the audit log (entry{' '}
          <span className="font-mono">#{summary.auditId}</span>).
        </p>
      </div>
      <Button size="sm" variant="ghost" className="h-6 px-1.5 text-xs" onClick={onDismiss}>
        Dismiss
      </Button>
    </div>
  );
}

function ArrivedFromDuplicate({ notice }: { notice: MergedNotice }) {
  return (
    <p
      role="note"
      className="rounded-md border border-accent/40 bg-accent-soft px-3 py-2 text-[13px]"
    >
      Case <span className="font-mono">#{notice.id}</span>
      {notice.title ? ` “${notice.title}”` : ''} was merged into this one: the link you followed
      leads here now.
    </p>
  );
}

export function MergedNotices({ detail }: { detail: CaseDetail }) {
  const { state } = useLocation();
  const [search] = useSearchParams();
  const [dismissed, setDismissed] = useState(false);
  const outcome = dismissed ? null : mergeOutcomeFrom(state, detail.id);
  const notice = mergedNoticeOf(search, detail);
  if (!outcome && !notice) return null;
  return (
    <div className="space-y-2 px-4 pt-3">
      {outcome && <JustMerged outcome={outcome} onDismiss={() => setDismissed(true)} />}
      {notice && <ArrivedFromDuplicate notice={notice} />}
    </div>
  );
}

/** "Merged here: #12 …, #14 …", linking to the history, where their write-ups are kept. */
export function MergedFromLine({ detail }: { detail: CaseDetail }) {
  const merged = detail.mergedFrom ?? [];
  if (merged.length === 0) return null;
  return (
    <p className="mt-1 text-xs text-ink-muted">
      Merged into this case:{' '}
      {merged.map((from, index) => (
        <span key={from.id}>
          {index > 0 && ', '}
          <span className="font-mono text-ink-faint">#{from.id}</span> {from.title}
        </span>
      ))}{' '}
      (
      <Link to={paths.caseHistory.getHref(detail.id)} className="text-accent hover:underline">
        their write-ups are in the history
      </Link>
      )
    </p>
  );
}
