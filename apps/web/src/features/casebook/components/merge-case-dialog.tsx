// A moderator folds this case (a duplicate) into another case of the same board, which is kept.
// The kept case is picked among cases that look alike, or found by words or by its number; the
// dialog says what will move before anything does, and the merge needs a reason like every
// moderator action.
import type { CaseDetail, CaseSummary } from '@railyard/shared';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, TextInput } from '../../../components/ui/field';
import { ReasonForm } from '../../../components/ui/reason-dialog';
import { paths } from '../../../config/paths';
import { formatCount } from '../../../lib/quantity-format';
import { boardCasesQueryOptions } from '../api/get-board-cases';
import { caseQueryOptions } from '../api/get-case';
import { useSimilarCases } from '../api/get-similar-cases';
import { useMergeCase } from '../api/merge-case';
import { caseFormFrom } from '../case-form';
import { caseNumberIn, mergeCandidates, mergeOutcomeState } from '../case-merge';
import { queryMaxLength } from '../case-vocabulary';
import { useSettled } from '../hooks/use-settled';
import { similarCasesParams } from '../similar-cases-query';
import { PersonName, ScoreLine } from './case-marks';
import { OutcomeBadge } from './outcome-badge';

const typingPause = 400;
const suggestionCount = '8';

type MergeCaseDialogProps = { detail: CaseDetail; open: boolean; onClose: () => void };

export function MergeCaseDialog({ detail, open, onClose }: MergeCaseDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={`Merge case #${detail.id} into another case`}
      description="Pick the case to keep: a published case of this board that describes the same fault. This case is the duplicate; what it holds moves to the kept case."
    >
      <MergeForm detail={detail} onCancel={onClose} />
    </Dialog>
  );
}

/** The kept case as the dialog shows it: what every source of candidates has in common. */
type Candidate = Pick<
  CaseSummary,
  'id' | 'board' | 'status' | 'title' | 'outcome' | 'author' | 'score' | 'commentCount'
>;

function useCandidates(detail: CaseDetail, query: string) {
  const settled = useSettled(query.trim().slice(0, queryMaxLength), typingPause);
  const number = caseNumberIn(settled);
  const similarParams = useMemo(() => {
    const params = similarCasesParams(caseFormFrom(detail), detail.id);
    return params && { ...params, limit: suggestionCount };
  }, [detail]);
  const similar = useSimilarCases(detail.board.slug, settled === '' ? similarParams : null);
  const search = useQuery({
    ...boardCasesQueryOptions(detail.board.slug, { q: settled, page: 1, drafts: false }),
    enabled: settled !== '',
  });
  const byNumber = useQuery({ ...caseQueryOptions(number ?? 0), enabled: number !== null });

  const lists: Array<readonly Candidate[] | undefined> =
    settled === ''
      ? [similar.data?.cases]
      : [number !== null && byNumber.data ? [byNumber.data] : undefined, search.data?.cases];
  const candidates = mergeCandidates(detail, lists).filter((found) => found.status === 'published');
  const pending =
    settled !== query.trim().slice(0, queryMaxLength) ||
    (settled === '' ? similar.isFetching : search.isFetching || byNumber.isFetching);
  const error = settled === '' ? similar.error : search.error;
  return { settled, candidates, pending, error };
}

function CandidateLine({ found }: { found: Candidate }) {
  return (
    <>
      <span className="block font-medium text-ink">
        <span className="mr-1.5 font-mono text-xs text-ink-faint">#{found.id}</span>
        {found.title}
      </span>
      <span className="mt-1 flex flex-wrap items-center gap-x-2.5 gap-y-1 text-xs text-ink-muted">
        <OutcomeBadge outcome={found.outcome} />
        <ScoreLine score={found.score} />
        <span>
          by <PersonName person={found.author} />
        </span>
        <span>
          {formatCount(found.commentCount)} {found.commentCount === 1 ? 'comment' : 'comments'}
        </span>
      </span>
    </>
  );
}

function CandidatePicker({
  detail,
  onPick,
}: {
  detail: CaseDetail;
  onPick: (found: Candidate) => void;
}) {
  const [query, setQuery] = useState('');
  const { settled, candidates, pending, error } = useCandidates(detail, query);
  return (
    <div className="space-y-2">
      <Field
        label="Find the case to keep"
        hint="Words from its title or write-up, or its number (#12). Empty: cases that look like this one."
      >
        {(control) => (
          <TextInput
            {...control}
            type="search"
            autoFocus
            autoComplete="off"
            maxLength={queryMaxLength}
            value={query}
            onChange={(event) => setQuery(event.target.value)}
          />
        )}
      </Field>
      <div aria-live="polite" className="text-[13px]">
        <p className="flex items-baseline gap-2 text-xs text-ink-muted">
          {settled === ''
            ? 'Cases of this board that look like this one'
            : `Cases matching “${settled}”`}
          {pending && <span className="text-ink-faint">looking…</span>}
        </p>
        {error ? (
          <p className="mt-1 text-danger">Could not look for cases: {error.message}</p>
        ) : candidates.length === 0 ? (
          !pending && (
            <p className="mt-1 text-ink-muted">
              {settled === ''
                ? 'None looks alike. Search by words or by the case number.'
                : 'No other published case of this board matches.'}
            </p>
          )
        ) : (
          <ul className="mt-1 max-h-64 overflow-y-auto rounded-md border border-line">
            {candidates.map((found) => (
              <li key={found.id} className="border-b border-line/60 last:border-b-0">
                <button
                  type="button"
                  onClick={() => onPick(found)}
                  className="block w-full px-2.5 py-2 text-left hover:bg-raised focus-visible:bg-raised"
                >
                  <CandidateLine found={found} />
                </button>
              </li>
            ))}
          </ul>
        )}
      </div>
    </div>
  );
}

/** What the merge does, said before it is done. */
function MergeConsequences({ detail, kept }: { detail: CaseDetail; kept: Candidate }) {
  return (
    <div className="rounded-md border border-caution/45 bg-caution-soft px-3 py-2 text-[13px]">
      <p>
        <span className="font-mono">#{detail.id}</span> “{detail.title}” becomes part of{' '}
        <span className="font-mono">#{kept.id}</span> “{kept.title}”:
      </p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5 text-ink-muted">
        <li>
          its net and part links, readings, photos and files and comments move to{' '}
          <span className="font-mono">#{kept.id}</span>;
        </li>
        <li>
          votes and confirmations move too, one per person: where someone voted on or confirmed both
          cases, the one on <span className="font-mono">#{kept.id}</span> stays and the other is
          left on the duplicate;
        </li>
        <li>
          its title and write-up are kept in the history of{' '}
          <span className="font-mono">#{kept.id}</span>, and links to{' '}
          <span className="font-mono">#{detail.id}</span> lead there from now on.
        </li>
      </ul>
      <p className="mt-1 text-ink-muted">
        Nothing is deleted; an admin can undo the merge from the audit log.
      </p>
    </div>
  );
}

function MergeForm({ detail, onCancel }: { detail: CaseDetail; onCancel: () => void }) {
  const [kept, setKept] = useState<Candidate | null>(null);
  const [reason, setReason] = useState('');
  const merge = useMergeCase(detail.board.slug, detail.id);
  const navigate = useNavigate();

  if (!kept) {
    return (
      <div className="space-y-3">
        <CandidatePicker detail={detail} onPick={setKept} />
        <div className="flex justify-end">
          <Button size="sm" variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        </div>
      </div>
    );
  }

  return (
    <ReasonForm
      reasonLabel="Why you merge them"
      placeholder="e.g. same shorted capacitor on VSYS, written up twice"
      confirmLabel={`Merge into #${kept.id}`}
      pendingLabel="Merging…"
      failedTitle="Not merged"
      tone="danger"
      pending={merge.isPending}
      error={merge.error}
      reason={reason}
      onReasonChange={setReason}
      onCancel={onCancel}
      onConfirm={(trimmed) =>
        merge.mutate(
          { intoCaseId: kept.id, reason: trimmed },
          {
            onSuccess: (result) =>
              void navigate(paths.case.getHref(result.case.id), {
                replace: true,
                state: mergeOutcomeState({ summary: result.merge, fromTitle: detail.title }),
              }),
          },
        )
      }
    >
      <div className="rounded-md border border-line px-2.5 py-2 text-[13px]">
        <div className="flex items-baseline justify-between gap-2">
          <span className="text-xs text-ink-muted">Keep</span>
          <Button
            size="sm"
            variant="ghost"
            className="h-6 px-1.5 text-xs"
            disabled={merge.isPending}
            onClick={() => {
              setKept(null);
              merge.reset();
            }}
          >
            Pick another
          </Button>
        </div>
        <CandidateLine found={kept} />
      </div>
      <MergeConsequences detail={detail} kept={kept} />
    </ReasonForm>
  );
}
