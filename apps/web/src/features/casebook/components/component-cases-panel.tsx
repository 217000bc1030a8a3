// On a part's page: the write-ups that name the part, culprit or not, best rated first. A part that
// keeps turning up as the culprit on one board is worth checking first on the next one.
import { Link } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { formatCount } from '../../../lib/quantity-format';
import { useComponentCases } from '../api/get-component-cases';
import { CaseRow } from './case-row';

/** how many cases the panel lists; a route prefetching them asks for the same page */
export const componentCasesShown = 8;

export function ComponentCasesPanel({ slug, refdes }: { slug: string; refdes: string }) {
  const cases = useComponentCases(slug, refdes, componentCasesShown);
  return (
    <section
      aria-labelledby="component-cases-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="flex items-baseline gap-2 border-b border-line px-3 py-2">
        <h2 id="component-cases-title" className="text-sm font-semibold">
          Cases naming this part
        </h2>
        {cases.data && (
          <span className="text-xs text-ink-muted">{formatCount(cases.data.total)}</span>
        )}
      </header>
      {cases.isPending ? (
        <div aria-busy="true" className="m-3 h-14 animate-pulse rounded bg-raised">
          <span className="sr-only">Loading the cases naming {refdes}…</span>
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
          No published case names <span className="font-mono text-ink">{cases.data.refdes}</span>{' '}
          yet.
        </p>
      ) : (
        <>
          <ol>
            {cases.data.cases.map((summary) => (
              <CaseRow key={summary.id} slug={slug} summary={summary} />
            ))}
          </ol>
          {cases.data.total > cases.data.cases.length && (
            <p className="border-t border-line px-3 py-2 text-[13px]">
              <Link
                to={paths.boardCases.getHref(slug, { component: cases.data.refdes })}
                className="text-accent hover:underline"
              >
                All {formatCount(cases.data.total)} cases naming {cases.data.refdes} →
              </Link>
            </p>
          )}
        </>
      )}
    </section>
  );
}
