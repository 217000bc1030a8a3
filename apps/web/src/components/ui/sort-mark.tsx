// The sort state of a table column header, for both the eye and a screen reader.
import type { Header } from '@tanstack/react-table';
import type { ReactNode } from 'react';

/** The header's `aria-sort`; none for a column that cannot be sorted at all. */
export function ariaSort<TData>(header: Header<TData, unknown>) {
  if (!header.column.getCanSort()) return undefined;
  const sorted = header.column.getIsSorted();
  return sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none';
}

/** Two small triangles; the one lit says which way the column is sorted. */
export function SortMark({ direction }: { direction: false | 'asc' | 'desc' }) {
  return (
    <svg viewBox="0 0 8 12" width="7" height="11" aria-hidden="true" className="shrink-0">
      <path d="M4 1 7 4.5H1Z" fill="currentColor" opacity={direction === 'asc' ? 1 : 0.25} />
      <path d="M4 11 1 7.5h6Z" fill="currentColor" opacity={direction === 'desc' ? 1 : 0.25} />
    </svg>
  );
}

/** A column header's content: a button that toggles the sort when the column sorts, else the label. */
export function SortableHeaderLabel<TData>({
  header,
  label,
  numeric = false,
}: {
  header: Header<TData, unknown>;
  label: ReactNode;
  /** numbers sit right-aligned, so the mark goes before the label */
  numeric?: boolean;
}) {
  if (!header.column.getCanSort()) return <span className="px-1">{label}</span>;
  return (
    <button
      type="button"
      onClick={header.column.getToggleSortingHandler()}
      className={`inline-flex w-full items-center gap-1.5 rounded px-1 py-0.5 hover:text-ink ${numeric ? 'flex-row-reverse' : ''} ${header.column.getIsSorted() ? 'text-ink' : ''}`}
    >
      <span>{label}</span>
      <SortMark direction={header.column.getIsSorted()} />
    </button>
  );
}
