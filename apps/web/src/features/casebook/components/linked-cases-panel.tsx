// The side panel of a part's or a net's page: the published cases linked to it, best rated first,
// and a way to the board's full list filtered the same way when there are more than it shows.
import type { CaseSummary } from '@railyard/shared';
import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { formatCount } from '../../../lib/quantity-format';

type LinkedCasesPanelProps = {
  titleId: string;
  title: string;
  cases: UseQueryResult<{ total: number; cases: CaseSummary[] }>;
  /** the part or net, in the board's spelling once the answer has it */
  subject: string;
  /** how the cases relate to the subject: "the cases naming C2", "the cases on VSYS" */
  relation: 'naming' | 'on';
  /** the board's case list filtered to the subject */
  allCasesHref: string;
  /** at the right end of the header */
  headerAction?: ReactNode;
  /** between the header and the list, once there are cases */
  aboveList?: ReactNode;
  renderCase: (summary: CaseSummary) => ReactNode;
};

export function LinkedCasesPanel({
  titleId,
  title,
  cases,
  subject,
  relation,
  allCasesHref,
  headerAction,
  aboveList,
  renderCase,
}: LinkedCasesPanelProps) {
  return (
    <section aria-labelledby={titleId} className="rounded-md border border-line bg-surface">
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id={titleId} className="text-sm font-semibold">
          {title}
        </h2>
        {cases.data && (
          <span className="text-xs text-ink-muted">{formatCount(cases.data.total)}</span>
        )}
        {headerAction}
      </header>
      {cases.isPending ? (
        <div aria-busy="true" className="m-3 h-14 animate-pulse rounded bg-raised">
          <span className="sr-only">
            Loading the cases {relation} {subject}…
          </span>
        </div>
      ) : cases.isError ? (
        <div className="p-3">
          <ErrorPanel
            compact
            error={cases.error}
            title="Could not list the cases"
            actions={
              <Button size="sm" onClick={() => void cases.refetch()}>
                Try again
              </Button>
            }
          />
        </div>
      ) : cases.data.cases.length === 0 ? (
        <p className="px-3 py-2.5 text-[13px] text-ink-muted">
          No published case names <span className="font-mono text-ink">{subject}</span> yet.
        </p>
      ) : (
        <>
          {aboveList}
          <ol>{cases.data.cases.map(renderCase)}</ol>
          {cases.data.total > cases.data.cases.length && (
            <p className="border-t border-line px-3 py-2 text-[13px]">
              <Link to={allCasesHref} className="text-accent hover:underline">
                All {formatCount(cases.data.total)} cases {relation} {subject} →
              </Link>
            </p>
          )}
        </>
      )}
    </section>
  );
}
