// Rail search over every board. The URL keeps the query (?q=), so a search can be bookmarked
// or sent; typing replaces the history entry instead of adding one per keystroke.
import { useEffect, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ErrorPanel } from '../../components/errors/error-panel';
import { PageHeader } from '../../components/layout/page-header';
import { Button } from '../../components/ui/button';
import { controlClass } from '../../components/ui/field';
import { useRailSearch } from '../../features/rails/api/search-rails';
import { RailSearchResults } from '../../features/rails/components/rail-search-results';

const typingPause = 250;

export default function SearchRoute() {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = (searchParams.get('q') ?? '').trim();
  const [text, setText] = useState(query);

  // Back and forward change the URL under the field: the field follows.
  const [shownQuery, setShownQuery] = useState(query);
  if (query !== shownQuery) {
    setShownQuery(query);
    if (text.trim() !== query) setText(query);
  }

  useEffect(() => {
    const next = text.trim();
    if (next === query) return;
    const timer = setTimeout(
      () => setSearchParams(next ? { q: next } : {}, { replace: true, preventScrollReset: true }),
      typingPause,
    );
    return () => clearTimeout(timer);
  }, [text, query, setSearchParams]);

  const search = useRailSearch(query);

  return (
    <div className="mx-auto max-w-4xl px-4 py-5">
      <title>{query ? `“${query}” · Search · Railyard` : 'Search · Railyard'}</title>
      <PageHeader
        title="Find a rail"
        description="Searches the net names and aliases of every board. Case and separators do not matter: “vcc 3v3” finds VCC_3V3."
      />
      <form role="search" onSubmit={(event) => event.preventDefault()} className="mb-4">
        <label htmlFor="rail-search" className="sr-only">
          Rail name or alias
        </label>
        <input
          id="rail-search"
          type="search"
          // The page exists to type into this field.
          autoFocus
          autoComplete="off"
          spellCheck={false}
          maxLength={100}
          placeholder="e.g. vsys, 3v3, usb vbus"
          value={text}
          onChange={(event) => setText(event.target.value)}
          className={`${controlClass} h-9.5 font-mono text-[15px]`}
        />
      </form>
      <div aria-live="polite" aria-busy={search.isFetching}>
        {!query ? (
          <p className="text-sm text-ink-muted">Type part of a rail name or alias.</p>
        ) : search.isError ? (
          <ErrorPanel
            error={search.error}
            title="The search failed"
            actions={
              <Button size="sm" onClick={() => void search.refetch()}>
                Try again
              </Button>
            }
          />
        ) : search.data ? (
          <div className={search.isPlaceholderData ? 'opacity-60 transition-opacity' : ''}>
            <RailSearchResults response={search.data} />
          </div>
        ) : (
          <p className="text-sm text-ink-muted">Searching…</p>
        )}
      </div>
    </div>
  );
}
