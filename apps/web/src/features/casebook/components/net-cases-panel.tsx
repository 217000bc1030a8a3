// On a net's page: the write-ups of repairs on this rail, best rated first, and the parts that were
// at fault in the solved ones, which are the parts to suspect first.
import { Link } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { formatCount } from '../../../lib/quantity-format';
import { useViewer } from '../../../lib/viewer';
import { useNetCases } from '../api/get-net-cases';
import { culpritTally } from '../culprit-tally';
import { CulpritChip, ScoreLine } from './case-marks';
import { OutcomeBadge } from './outcome-badge';

const shownCases = 5;

export function NetCasesPanel({ slug, net }: { slug: string; net: string }) {
  const cases = useNetCases(slug, net, shownCases);
  const viewer = useViewer();
  const data = cases.data;
  const culprits = data ? culpritTally(data.cases) : [];
  return (
    <section aria-labelledby="net-cases-title" className="rounded-md border border-line bg-surface">
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="net-cases-title" className="text-sm font-semibold">
          Cases on this rail
        </h2>
        {data && <span className="text-xs text-ink-muted">{formatCount(data.total)}</span>}
        {viewer && (
          <Link
            to={paths.newCase.getHref(slug, { net })}
            className="ml-auto text-xs text-accent hover:underline"
          >
            Write one up
          </Link>
        )}
      </header>
      {cases.isPending ? (
        <div aria-busy="true" className="m-3 h-14 animate-pulse rounded bg-raised">
          <span className="sr-only">Loading the cases on {net}…</span>
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
      ) : data && data.cases.length === 0 ? (
        <p className="px-3 py-2.5 text-[13px] text-ink-muted">
          No published case names <span className="font-mono text-ink">{data.net}</span> yet.
        </p>
      ) : data ? (
        <>
          {culprits.length > 0 && (
            <div className="flex flex-wrap items-center gap-1.5 border-b border-line/70 px-3 py-2 text-xs text-ink-muted">
              <span>At fault when solved:</span>
              {culprits.map(({ refdes, cases: count }) => (
                <CulpritChip
                  key={refdes}
                  refdes={count > 1 ? `${refdes} ×${count}` : refdes}
                  title={`${refdes} was the culprit in ${count} solved ${count === 1 ? 'case' : 'cases'} listed here`}
                />
              ))}
            </div>
          )}
          <ol>
            {data.cases.map((summary) => (
              <li key={summary.id} className="border-b border-line/70 px-3 py-2 last:border-b-0">
                <Link
                  to={paths.case.getHref(summary.id)}
                  className="text-[13px] font-medium text-ink hover:text-accent hover:underline"
                >
                  {summary.title}
                </Link>
                <div className="mt-1 flex flex-wrap items-center gap-x-2.5 gap-y-1">
                  <OutcomeBadge outcome={summary.outcome} />
                  <ScoreLine score={summary.score} />
                </div>
              </li>
            ))}
          </ol>
          {data.total > data.cases.length && (
            <p className="border-t border-line px-3 py-2 text-[13px]">
              <Link
                to={paths.boardCases.getHref(slug, { net: data.net })}
                className="text-accent hover:underline"
              >
                All {formatCount(data.total)} cases on {data.net} →
              </Link>
            </p>
          )}
        </>
      ) : null}
    </section>
  );
}
