// How a repair ended, as a badge: the word and a glyph carry it, the tone only repeats it, so the
// three stay apart for colour-blind readers and on a dim bench monitor.
import type { CaseOutcome, CaseStatus } from '@railyard/shared';
import { Badge } from '../../../components/ui/badge';
import { StrokeGlyph } from '../../../components/ui/glyph';
import { outcomeHint, outcomeLabel } from '../case-vocabulary';

const outcomeTone: Record<CaseOutcome, string> = {
  solved: 'text-ok bg-ok-soft border-ok/40',
  partly: 'text-caution bg-caution-soft border-caution/40',
  not_solved: 'text-ink-muted bg-raised border-line-strong',
};

export function OutcomeGlyph({ outcome, size = 11 }: { outcome: CaseOutcome; size?: number }) {
  return (
    <StrokeGlyph size={size} strokeWidth={1.6}>
      {outcome === 'solved' && <path d="M2.2 6.4 4.8 9 9.8 3.2" />}
      {outcome === 'partly' && (
        <>
          <circle cx="6" cy="6" r="4.2" />
          <path d="M6 1.8v8.4A4.2 4.2 0 0 0 6 1.8Z" fill="currentColor" />
        </>
      )}
      {outcome === 'not_solved' && <path d="M3 3l6 6M9 3 3 9" />}
    </StrokeGlyph>
  );
}

export function OutcomeBadge({ outcome }: { outcome: CaseOutcome }) {
  return (
    <Badge tone={outcomeTone[outcome]} title={outcomeHint[outcome]}>
      <OutcomeGlyph outcome={outcome} />
      {outcomeLabel[outcome]}
    </Badge>
  );
}

/** Marks a draft: seen by its author only until it is published. */
export function StatusBadge({ status }: { status: CaseStatus }) {
  if (status !== 'draft') return null;
  return (
    <span
      title="Only you see a draft until you publish it"
      className="inline-flex h-5 shrink-0 items-center rounded border border-dashed border-line-strong px-1.5 text-[11.5px] leading-none font-medium text-ink-muted"
    >
      draft
    </span>
  );
}
