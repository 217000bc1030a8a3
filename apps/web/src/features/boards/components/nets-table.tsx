// The nets of a board, sortable, with one net selected at a time. A board has thousands of
// nets, so the table model only sorts, rows are drawn by one memoised row component (not
// per-cell renderers), and they arrive in growing pages: the first paint and every
// keystroke in the filter stay fast.
import type { NetKind, NetRow } from '@railyard/shared';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { memo, useCallback, useRef, type KeyboardEvent } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { NetKindBadge, netKindOrder } from '../../../components/ui/net-kind-badge';
import { ariaSort, SortableHeaderLabel } from '../../../components/ui/sort-mark';
import { paths } from '../../../config/paths';
import { naturalCompare } from '../../../lib/natural-order';
import { formatCount, formatVolts } from '../../../lib/quantity-format';

export const netRowsPerPage = 200;

const pageStep = 20;
const rowSteps: Record<string, number> = {
  ArrowDown: 1,
  ArrowUp: -1,
  PageDown: pageStep,
  PageUp: -pageStep,
  Home: -Infinity,
  End: Infinity,
};

const kindRank = (kind: NetKind) => netKindOrder.indexOf(kind);

const column = createColumnHelper<NetRow>();

const columns = [
  column.accessor('name', {
    header: 'Net',
    sortingFn: (a, b) => naturalCompare(a.original.name, b.original.name),
  }),
  column.accessor('kind', {
    header: 'Kind',
    sortingFn: (a, b) =>
      kindRank(a.original.kind) - kindRank(b.original.kind) ||
      naturalCompare(a.original.name, b.original.name),
  }),
  // Unknown voltages stay at the bottom whichever way the column is sorted.
  column.accessor((net) => net.nominalVoltage ?? undefined, {
    id: 'nominalVoltage',
    header: 'Nominal',
    sortUndefined: 'last',
    sortDescFirst: true,
    meta: { numeric: true },
  }),
  column.accessor('componentCount', {
    header: 'Components',
    sortDescFirst: true,
    meta: { numeric: true },
  }),
  column.accessor('pinCount', {
    header: 'Pins',
    sortDescFirst: true,
    meta: { numeric: true },
  }),
  column.accessor((net) => net.aliases.join(', '), {
    id: 'aliases',
    header: 'Aliases',
    sortingFn: (a, b) => naturalCompare(a.getValue('aliases'), b.getValue('aliases')),
  }),
  column.accessor('description', { header: 'Description', enableSorting: false }),
];

declare module '@tanstack/react-table' {
  interface ColumnMeta<TData, TValue> {
    numeric?: boolean;
  }
}

const columnWidths: Record<string, string> = {
  name: 'w-[15rem]',
  kind: 'w-[6.5rem]',
  nominalVoltage: 'w-[6.5rem]',
  componentCount: 'w-[7rem]',
  pinCount: 'w-[5rem]',
  aliases: 'w-[11rem]',
  description: 'w-auto',
};

type NetsTableProps = {
  slug: string;
  nets: NetRow[];
  sorting: SortingState;
  onSortingChange: (sorting: SortingState) => void;
  selected: string | null;
  onSelect: (name: string) => void;
  limit: number;
  onLimitChange: (limit: number) => void;
};

export function NetsTable({
  slug,
  nets,
  sorting,
  onSortingChange,
  selected,
  onSelect,
  limit,
  onLimitChange,
}: NetsTableProps) {
  const table = useReactTable({
    data: nets,
    columns,
    state: { sorting },
    onSortingChange: (updater) =>
      onSortingChange(typeof updater === 'function' ? updater(sorting) : updater),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (net) => net.name,
  });
  const bodyRef = useRef<HTMLTableSectionElement>(null);

  const rows = table.getRowModel().rows;
  const shown = rows.slice(0, limit);
  // One tab stop for the whole table (roving tabindex): Tab moves past 5,000 rows in one
  // press, the arrow keys move within them.
  const tabStop = shown.some((row) => row.id === selected) ? selected : (shown[0]?.id ?? null);

  // The arrow keys walk the rows like a list: focus moves, and the side panel follows it.
  const onKeyDown = useCallback(
    (event: KeyboardEvent<HTMLTableSectionElement>) => {
      const step = rowSteps[event.key];
      if (step === undefined) return;
      const links = Array.from(
        bodyRef.current?.querySelectorAll<HTMLAnchorElement>('a[data-net]') ?? [],
      );
      const index = links.indexOf(document.activeElement as HTMLAnchorElement);
      if (index < 0) return;
      const target = Math.min(links.length - 1, Math.max(0, index + step));
      const next = links[target];
      if (!next || target === index) return;
      event.preventDefault();
      next.focus();
      next.scrollIntoView({ block: 'nearest' });
      onSelect(next.dataset.net ?? '');
    },
    [onSelect],
  );

  return (
    <div className="flex min-h-0 flex-col">
      <div className="max-h-[calc(100dvh-7.5rem)] min-h-72 overflow-auto rounded-md border border-line bg-surface">
        <table className="w-full min-w-[48rem] table-fixed border-collapse text-[13px]">
          <colgroup>
            {table.getVisibleLeafColumns().map((col) => (
              <col key={col.id} className={columnWidths[col.id]} />
            ))}
          </colgroup>
          <thead className="sticky top-0 z-10 bg-raised shadow-[0_1px_0_var(--ry-line)]">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const numeric = header.column.columnDef.meta?.numeric;
                  const label = flexRender(header.column.columnDef.header, header.getContext());
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={ariaSort(header)}
                      className={`h-8 px-2 text-xs font-medium text-ink-muted ${numeric ? 'text-right' : 'text-left'}`}
                    >
                      <SortableHeaderLabel header={header} label={label} numeric={numeric} />
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody ref={bodyRef} onKeyDown={onKeyDown}>
            {shown.map((row) => (
              <NetTableRow
                key={row.id}
                slug={slug}
                net={row.original}
                selected={row.id === selected}
                tabbable={row.id === tabStop}
                onSelect={onSelect}
              />
            ))}
          </tbody>
        </table>
        {rows.length === 0 && (
          <p className="px-4 py-8 text-center text-sm text-ink-muted">
            No net matches this filter.
          </p>
        )}
        {rows.length > shown.length && (
          <div className="flex items-center gap-3 border-t border-line px-3 py-2 text-[13px] text-ink-muted">
            <span>
              Showing {formatCount(shown.length)} of {formatCount(rows.length)}
            </span>
            <Button size="sm" onClick={() => onLimitChange(limit + netRowsPerPage)}>
              Show {formatCount(Math.min(netRowsPerPage, rows.length - shown.length))} more
            </Button>
            <Button size="sm" variant="ghost" onClick={() => onLimitChange(rows.length)}>
              Show all
            </Button>
          </div>
        )}
      </div>
    </div>
  );
}

const tdClass = 'h-7 px-2 py-0 align-middle';

// Memoised: typing in the filter re-renders the table, not the rows that did not change.
const NetTableRow = memo(function NetTableRow({
  slug,
  net,
  selected,
  tabbable,
  onSelect,
}: {
  slug: string;
  net: NetRow;
  selected: boolean;
  tabbable: boolean;
  onSelect: (name: string) => void;
}) {
  const aliases = net.aliases.join(', ');
  return (
    <tr
      onClick={() => onSelect(net.name)}
      className={`cursor-pointer border-b border-line/70 ${
        selected ? 'bg-select shadow-[inset_3px_0_0_var(--ry-accent)]' : 'hover:bg-raised/60'
      }`}
    >
      <td className={`${tdClass} pl-1`}>
        {/* The name opens the net's page; the rest of the row selects it for the side panel. */}
        <Link
          to={paths.net.getHref(slug, net.name)}
          data-net={net.name}
          aria-current={selected ? 'true' : undefined}
          tabIndex={tabbable ? 0 : -1}
          onClick={(event) => event.stopPropagation()}
          title={`Open ${net.name}`}
          className={`block w-full truncate rounded px-1.5 py-0.5 text-left font-mono text-[13px] hover:underline ${
            selected ? 'font-medium text-accent' : 'text-ink'
          }`}
        >
          {net.name}
        </Link>
      </td>
      <td className={tdClass}>
        <NetKindBadge kind={net.kind} />
      </td>
      <td className={`${tdClass} text-right font-mono tabular`}>
        {formatVolts(net.nominalVoltage)}
      </td>
      <td className={`${tdClass} text-right font-mono tabular`}>
        {formatCount(net.componentCount)}
      </td>
      <td className={`${tdClass} text-right font-mono tabular`}>{formatCount(net.pinCount)}</td>
      <td
        className={`${tdClass} truncate font-mono text-xs text-ink-muted`}
        title={aliases || undefined}
      >
        {aliases}
      </td>
      <td className={`${tdClass} truncate text-ink-muted`} title={net.description || undefined}>
        {net.description}
      </td>
    </tr>
  );
});
