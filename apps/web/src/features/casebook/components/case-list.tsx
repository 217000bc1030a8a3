// A board's casebook: every published write-up, filtered by net, part and outcome, searched by the
// API's full-text search, ranked by rating, match or date. The filters live in the address.
import type { CaseOutcome, CaseSort, NetRow } from '@railyard/shared';
import { useEffect, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { controlClass, Select } from '../../../components/ui/field';
import { NetKindGlyph } from '../../../components/ui/net-kind-badge';
import { isApiError } from '../../../lib/api-client';
import { formatCount, formatVolts } from '../../../lib/quantity-format';
import { useBoardCases } from '../api/get-board-cases';
import {
  effectiveSort,
  filtersFromSearch,
  pageRange,
  searchFromFilters,
  type CaseListFilters,
} from '../case-list-params';
import {
  outcomeLabel,
  outcomesInOrder,
  queryMaxLength,
  sortLabel,
  sortsInOrder,
} from '../case-vocabulary';
import { CaseRow } from './case-row';
import { NameCombobox } from './name-combobox';
import { OutcomeGlyph } from './outcome-badge';
import { CrossGlyph } from '../../../components/ui/glyph';

const typingPause = 300;

const chip = 'inline-flex h-7 items-center gap-1.5 rounded-md border px-2 text-[13px]';
const labelClass = 'text-[11px] font-medium tracking-wider text-ink-faint uppercase';

function FilterChip({
  label,
  value,
  onClear,
}: {
  label: string;
  value: string;
  onClear: () => void;
}) {
  return (
    <span className={`${chip} border-accent/60 bg-accent-soft text-ink`}>
      <span className="text-ink-muted">{label}</span>
      <span className="font-mono">{value}</span>
      <button
        type="button"
        onClick={onClear}
        aria-label={`Remove the ${label} filter ${value}`}
        title="Remove this filter"
        className="-mr-1 inline-grid size-5 place-items-center rounded text-ink-muted hover:bg-raised hover:text-ink"
      >
        <CrossGlyph size={10} />
      </button>
    </span>
  );
}

type CaseListProps = {
  slug: string;
  /** the board's nets for the net filter; undefined while they load */
  nets: readonly NetRow[] | undefined;
  /** whether the viewer is signed in, and so has drafts to list */
  signedIn: boolean;
};

export function CaseList({ slug, nets, signedIn }: CaseListProps) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = filtersFromSearch(searchParams);
  const list = useBoardCases(slug, filters);

  /** Any change of filter starts again at the first page; the history gets one entry per change. */
  const change = (next: Partial<CaseListFilters>, options: { replace?: boolean } = {}) => {
    const merged: CaseListFilters = { ...filters, page: 1, ...next };
    setSearchParams(searchFromFilters(merged), {
      replace: options.replace,
      preventScrollReset: true,
    });
  };
  const without = (key: 'net' | 'component' | 'outcome' | 'q' | 'sort') => {
    const next: CaseListFilters = { ...filters, page: 1 };
    delete next[key];
    setSearchParams(searchFromFilters(next), { preventScrollReset: true });
  };

  // The search text follows the address (back and forward), and typing updates the address
  // after a pause, replacing the entry instead of adding one per keystroke.
  const [text, setText] = useState(filters.q ?? '');
  const [shownQuery, setShownQuery] = useState(filters.q ?? '');
  if ((filters.q ?? '') !== shownQuery) {
    setShownQuery(filters.q ?? '');
    if (text.trim() !== (filters.q ?? '')) setText(filters.q ?? '');
  }
  const query = filters.q ?? '';
  useEffect(() => {
    const next = text.trim();
    if (next === query) return;
    const timer = setTimeout(() => {
      const merged: CaseListFilters = { ...filtersFromSearch(searchParams), page: 1 };
      if (next) merged.q = next;
      else {
        delete merged.q;
        if (merged.sort === 'relevance') delete merged.sort;
      }
      setSearchParams(searchFromFilters(merged), { replace: true, preventScrollReset: true });
    }, typingPause);
    return () => clearTimeout(timer);
  }, [text, query, searchParams, setSearchParams]);

  const [netText, setNetText] = useState('');
  const [partText, setPartText] = useState('');
  const sort = effectiveSort(filters);
  const data = list.data;
  const range = data ? pageRange(data.page, data.pageSize, data.total) : null;
  const filtered = Boolean(filters.net || filters.component || filters.outcome || filters.q);

  return (
    <section aria-label="Cases" className="space-y-3">
      <div className="space-y-2 rounded-md border border-line bg-surface px-3 py-2.5">
        <div className="flex flex-wrap items-center gap-x-3 gap-y-2">
          <div className="w-80 max-w-full">
            <label htmlFor="case-search" className="sr-only">
              Search the write-ups
            </label>
            <input
              id="case-search"
              type="search"
              autoComplete="off"
              maxLength={queryMaxLength}
              placeholder="Search symptoms, causes, fixes…"
              value={text}
              onChange={(event) => setText(event.target.value)}
              className={`${controlClass} h-8 text-[13px]`}
            />
          </div>
          {filters.net ? (
            <FilterChip label="net" value={filters.net} onClear={() => without('net')} />
          ) : (
            <NameCombobox
              what="nets"
              ariaLabel="Only cases on this net"
              placeholder="Net, e.g. VSYS"
              className="w-48"
              options={nets}
              text={netText}
              onTextChange={setNetText}
              onPick={(net) => {
                setNetText('');
                change({ net: net.name });
              }}
              onEnterText={(typed) => {
                setNetText('');
                change({ net: typed });
              }}
              detail={(net: NetRow) => (
                <>
                  {formatVolts(net.nominalVoltage)}
                  <NetKindGlyph kind={net.kind} size={11} />
                </>
              )}
            />
          )}
          {filters.component ? (
            <FilterChip
              label="part"
              value={filters.component}
              onClear={() => without('component')}
            />
          ) : (
            <form
              className="w-44"
              onSubmit={(event) => {
                event.preventDefault();
                const refdes = partText.trim();
                if (!refdes) return;
                setPartText('');
                change({ component: refdes });
              }}
            >
              <label htmlFor="case-part-filter" className="sr-only">
                Only cases naming this part (refdes)
              </label>
              <input
                id="case-part-filter"
                type="text"
                autoComplete="off"
                spellCheck={false}
                maxLength={64}
                placeholder="Part, e.g. C1013"
                value={partText}
                onChange={(event) => setPartText(event.target.value)}
                className={`${controlClass} h-8 font-mono text-[13px]`}
              />
            </form>
          )}
          <div className="ml-auto flex items-center gap-2">
            <label htmlFor="case-sort" className={labelClass}>
              Order
            </label>
            <Select
              id="case-sort"
              value={sort}
              onChange={(event) => change({ sort: event.target.value as CaseSort })}
              className="h-8 w-36 text-[13px]"
            >
              {sortsInOrder.map((option) => (
                <option key={option} value={option} disabled={option === 'relevance' && !filters.q}>
                  {sortLabel[option]}
                </option>
              ))}
            </Select>
          </div>
        </div>
        <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
          <div role="group" aria-label="Outcome" className="flex flex-wrap items-center gap-1.5">
            <span className={`${labelClass} mr-0.5`}>Outcome</span>
            <button
              type="button"
              aria-pressed={!filters.outcome}
              onClick={() => without('outcome')}
              className={`${chip} ${
                !filters.outcome
                  ? 'border-line-strong bg-raised text-ink'
                  : 'border-line text-ink-muted hover:text-ink'
              }`}
            >
              Any
            </button>
            {outcomesInOrder.map((outcome: CaseOutcome) => {
              const on = filters.outcome === outcome;
              return (
                <button
                  key={outcome}
                  type="button"
                  aria-pressed={on}
                  onClick={() => (on ? without('outcome') : change({ outcome }))}
                  className={`${chip} ${
                    on
                      ? 'border-accent/60 bg-accent-soft text-ink'
                      : 'border-line text-ink-muted hover:text-ink'
                  }`}
                >
                  <OutcomeGlyph outcome={outcome} />
                  {outcomeLabel[outcome]}
                </button>
              );
            })}
          </div>
          {signedIn && (
            <div role="group" aria-label="Which cases" className="flex items-center gap-1.5">
              <button
                type="button"
                aria-pressed={!filters.drafts}
                onClick={() => change({ drafts: false })}
                className={`${chip} ${!filters.drafts ? 'border-line-strong bg-raised text-ink' : 'border-line text-ink-muted hover:text-ink'}`}
              >
                Published
              </button>
              <button
                type="button"
                aria-pressed={filters.drafts}
                onClick={() => change({ drafts: true })}
                className={`${chip} ${filters.drafts ? 'border-line-strong bg-raised text-ink' : 'border-line text-ink-muted hover:text-ink'}`}
              >
                My drafts
              </button>
            </div>
          )}
          <p className="ml-auto text-[13px] text-ink-muted" aria-live="polite">
            {data && range ? (
              data.total === 0 ? (
                'No cases'
              ) : (
                <>
                  <span className="font-mono text-ink tabular">
                    {formatCount(range.first)}–{formatCount(range.last)}
                  </span>{' '}
                  of <span className="font-mono tabular">{formatCount(data.total)}</span>{' '}
                  {data.total === 1 ? 'case' : 'cases'}
                </>
              )
            ) : (
              ' '
            )}
          </p>
        </div>
      </div>

      <div aria-busy={list.isFetching}>
        {list.isError ? (
          <ErrorPanel
            compact
            error={list.error}
            title={
              isApiError(list.error) && list.error.status === 404
                ? 'Nothing on this board by that name'
                : 'Could not list the cases'
            }
            actions={
              <>
                {filtered && (
                  <Button
                    size="sm"
                    onClick={() => setSearchParams({}, { preventScrollReset: true })}
                  >
                    Clear the filters
                  </Button>
                )}
                <Button size="sm" variant="ghost" onClick={() => void list.refetch()}>
                  Try again
                </Button>
              </>
            }
          />
        ) : !data ? (
          <div aria-label="Loading the cases" className="space-y-1.5">
            {Array.from({ length: 5 }, (_, i) => (
              <div key={i} className="h-16 animate-pulse rounded-md bg-surface" />
            ))}
          </div>
        ) : data.cases.length === 0 ? (
          <div className="rounded-md border border-line bg-surface px-4 py-8 text-center text-sm text-ink-muted">
            {filters.drafts
              ? 'You have no drafts on this board.'
              : filtered
                ? 'No case matches these filters.'
                : 'Nobody has written up a repair of this board yet.'}
          </div>
        ) : (
          <ol
            className={`rounded-md border border-line bg-surface ${list.isPlaceholderData ? 'opacity-60 transition-opacity' : ''}`}
          >
            {data.cases.map((summary) => (
              <CaseRow key={summary.id} slug={slug} summary={summary} />
            ))}
          </ol>
        )}
      </div>

      {data && range && range.pages > 1 && (
        <nav aria-label="Pages" className="flex items-center justify-center gap-3 text-[13px]">
          <Button
            size="sm"
            disabled={data.page <= 1}
            onClick={() => change({ page: data.page - 1 })}
          >
            ← Previous
          </Button>
          <span className="text-ink-muted">
            Page <span className="font-mono text-ink tabular">{data.page}</span> of{' '}
            <span className="font-mono tabular">{range.pages}</span>
          </span>
          <Button
            size="sm"
            disabled={data.page >= range.pages}
            onClick={() => change({ page: data.page + 1 })}
          >
            Next →
          </Button>
        </nav>
      )}
    </section>
  );
}
