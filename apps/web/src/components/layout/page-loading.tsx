/** Placeholder while a page's code or data arrives: the shape of a page, no spinner. */
export function PageLoading() {
  return (
    <div className="px-4 py-5" aria-busy="true" aria-live="polite">
      <span className="sr-only">Loading…</span>
      <div className="h-6 w-64 animate-pulse rounded bg-raised" />
      <div className="mt-3 h-4 w-96 max-w-full animate-pulse rounded bg-raised" />
      <div className="mt-6 space-y-2">
        {Array.from({ length: 8 }, (_, i) => (
          <div key={i} className="h-7 animate-pulse rounded bg-surface" />
        ))}
      </div>
    </div>
  );
}
