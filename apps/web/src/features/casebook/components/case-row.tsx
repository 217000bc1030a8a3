import type { CaseSummary } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/date-format';
import { formatCount } from '../../../lib/quantity-format';
import { formatMinutes } from '../time-spent';
import { CulpritChip, NetChip, PersonName, ScoreLine } from './case-marks';
import { OutcomeBadge, StatusBadge } from './outcome-badge';

/** The date part of the reader's local "2025-03-01 14:05". */
function dateOf(iso: string | null): string {
  return formatDateTime(iso).slice(0, 10);
}

const shownNets = 6;

/** One case in a list: enough to tell whether it is the same fault as the one on the bench. */
export function CaseRow({ slug, summary }: { slug: string; summary: CaseSummary }) {
  const nets = summary.nets.slice(0, shownNets);
  const when = summary.publishedAt ?? summary.updatedAt;
  return (
    <li className="border-b border-line/70 px-3 py-2.5 last:border-b-0 hover:bg-raised/40">
      <div className="flex flex-wrap items-start gap-x-3 gap-y-1">
        <div className="min-w-0 flex-1">
          <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
            <OutcomeBadge outcome={summary.outcome} />
            <StatusBadge status={summary.status} />
            <h3 className="min-w-0 text-sm font-medium">
              <Link
                to={paths.case.getHref(summary.id)}
                className="text-ink hover:text-accent hover:underline"
              >
                {summary.title}
              </Link>
            </h3>
          </div>
          <p className="mt-0.5 line-clamp-1 text-[13px] text-ink-muted">{summary.symptom}</p>
        </div>
        <ScoreLine score={summary.score} className="pt-0.5" />
      </div>
      <div className="mt-1.5 flex flex-wrap items-center gap-x-4 gap-y-1.5 text-xs text-ink-muted">
        {summary.culprits.length > 0 && (
          <span className="flex flex-wrap items-center gap-1">
            <span className="sr-only">Culprits:</span>
            {summary.culprits.map((refdes) => (
              <CulpritChip key={refdes} refdes={refdes} />
            ))}
          </span>
        )}
        {nets.length > 0 && (
          <span className="flex min-w-0 flex-wrap items-center gap-1">
            <span className="sr-only">Nets:</span>
            {nets.map((net) => (
              <NetChip key={net} slug={slug} net={net} />
            ))}
            {summary.nets.length > nets.length && (
              <span className="text-ink-faint">+{summary.nets.length - nets.length}</span>
            )}
          </span>
        )}
        <span className="ml-auto flex flex-wrap items-center gap-x-2.5">
          <PersonName person={summary.author} />
          <time dateTime={when} className="font-mono tabular">
            {dateOf(when)}
          </time>
          {summary.minutesSpent !== null && (
            <span title="Time the repair took">{formatMinutes(summary.minutesSpent)}</span>
          )}
          {summary.commentCount > 0 && (
            <span>
              {formatCount(summary.commentCount)}{' '}
              {summary.commentCount === 1 ? 'comment' : 'comments'}
            </span>
          )}
        </span>
      </div>
    </li>
  );
}
