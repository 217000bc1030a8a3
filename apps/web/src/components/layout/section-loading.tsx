/** Placeholder for a page section while its data arrives: the section's frame, pulsing, no spinner. */
export function SectionLoading({ label }: { label: string }) {
  return (
    <div aria-busy="true" className="h-40 animate-pulse rounded-lg border border-line bg-surface">
      <span className="sr-only">{label}</span>
    </div>
  );
}
