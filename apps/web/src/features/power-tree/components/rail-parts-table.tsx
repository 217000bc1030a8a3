// Every part with a pin on the rail, sortable and filterable by kind and role, with the rail's
// total capacitance to ground: the figure a technician weighs a short's resistance reading against.
import type { LoadRole, RailLoads, RailPart } from '@railyard/shared';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { Fragment, useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { Count } from '../../../components/ui/count';
import { ariaSort, SortableHeaderLabel } from '../../../components/ui/sort-mark';
import { paths } from '../../../config/paths';
import { naturalCompare } from '../../../lib/natural-order';
import { formatCount, formatFarads } from '../../../lib/quantity-format';
import { toggled } from '../../../lib/toggled';
import { loadRolesInOrder } from '../tree-elements';

export const roleHint: Record<LoadRole, string> = {
  shunt: 'sits between the rail and ground: decoupling capacitors, clamps',
  draw: 'draws power from the rail',
  series: 'carries the rail on to another net',
  other: 'anything else on the rail: pull-ups, test points …',
};

const partsPerPage = 200;
const column = createColumnHelper<RailPart>();

// A value with a parsed magnitude sorts by it (100 nF before 1 µF); the rest by its text.
function compareValues(a: RailPart, b: RailPart): number {
  if (a.magnitude !== null && b.magnitude !== null && a.unit === b.unit) {
    return a.magnitude - b.magnitude;
  }
  if (a.magnitude !== null && b.magnitude === null) return -1;
  if (a.magnitude === null && b.magnitude !== null) return 1;
  return naturalCompare(a.value, b.value);
}

const columns = [
  column.accessor('refdes', {
    header: 'Refdes',
    sortingFn: (a, b) => naturalCompare(a.original.refdes, b.original.refdes),
  }),
  column.accessor('kind', { header: 'Kind' }),
  column.accessor('value', {
    header: 'Value',
    sortingFn: (a, b) => compareValues(a.original, b.original),
  }),
  column.accessor('package', {
    header: 'Package',
    sortingFn: (a, b) => naturalCompare(a.original.package, b.original.package),
  }),
  column.accessor((part) => part.side ?? undefined, {
    id: 'side',
    header: 'Side',
    sortUndefined: 'last',
  }),
  column.accessor('role', {
    header: 'Role',
    sortingFn: (a, b) =>
      loadRolesInOrder.indexOf(a.original.role) - loadRolesInOrder.indexOf(b.original.role) ||
      naturalCompare(a.original.refdes, b.original.refdes),
  }),
  column.accessor((part) => part.pins.join(', '), {
    id: 'pins',
    header: 'Pins here',
    sortingFn: (a, b) => naturalCompare(a.getValue('pins'), b.getValue('pins')),
  }),
  column.accessor((part) => part.otherNets.join(', '), {
    id: 'otherNets',
    header: 'Other nets',
    enableSorting: false,
  }),
];

const columnWidths: Record<string, string> = {
  refdes: 'w-[6rem]',
  kind: 'w-[6.5rem]',
  value: 'w-[9rem]',
  package: 'w-[7rem]',
  side: 'w-[4.5rem]',
  role: 'w-[5rem]',
  pins: 'w-[6rem]',
  otherNets: 'w-auto',
};

function Chips<T extends string>({
  label,
  values,
  counts,
  chosen,
  onChange,
  hint,
}: {
  label: string;
  values: readonly T[];
  counts: Record<string, number>;
  chosen: ReadonlySet<T>;
  onChange: (chosen: Set<T>) => void;
  hint?: (value: T) => string;
}) {
  const chip = 'inline-flex h-6.5 items-center gap-1.5 rounded-md border px-1.5 text-[12.5px]';
  return (
    <div role="group" aria-label={label} className="flex flex-wrap items-center gap-1">
      <span className="mr-1 text-[11px] font-medium tracking-wider text-ink-faint uppercase">
        {label}
      </span>
      {values.map((value) => {
        const on = chosen.has(value);
        return (
          <button
            key={value}
            type="button"
            aria-pressed={on}
            title={hint?.(value)}
            onClick={() => onChange(toggled(chosen, value))}
            className={`${chip} ${
              on
                ? 'border-accent/60 bg-accent-soft text-ink'
                : 'border-line text-ink-muted hover:text-ink'
            }`}
          >
            {value}
            <span className="font-mono text-[11px] tabular opacity-80">
              {formatCount(counts[value] ?? 0)}
            </span>
          </button>
        );
      })}
    </div>
  );
}

function CapacitanceLine({ capacitance }: { capacitance: RailLoads['capacitance'] }) {
  const { totalFarads, counted, unparsed } = capacitance;
  const shownUnparsed = unparsed.slice(0, 8);
  return (
    <p className="text-[13px] text-ink-muted">
      Capacitance to ground{' '}
      <span className="font-mono text-base font-medium text-ink tabular">
        {counted > 0 ? formatFarads(totalFarads) : '—'}
      </span>{' '}
      over <Count value={counted} /> {counted === 1 ? 'capacitor' : 'capacitors'}
      {unparsed.length > 0 && (
        <span className="ml-2 text-caution">
          · {formatCount(unparsed.length)} {unparsed.length === 1 ? 'capacitor' : 'capacitors'} with
          unreadable values not counted{' '}
          <span className="font-mono text-xs" title={unparsed.join(', ')}>
            ({shownUnparsed.join(', ')}
            {unparsed.length > shownUnparsed.length
              ? ` … +${unparsed.length - shownUnparsed.length}`
              : ''}
            )
          </span>
        </span>
      )}
    </p>
  );
}

export function RailPartsTable({
  slug,
  net,
  loads,
}: {
  slug: string;
  net: string;
  loads: RailLoads;
}) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'role', desc: false }]);
  const [kinds, setKinds] = useState<ReadonlySet<string>>(new Set());
  const [roles, setRoles] = useState<ReadonlySet<LoadRole>>(new Set());
  const [limit, setLimit] = useState(partsPerPage);

  const kindValues = useMemo(
    () =>
      Object.entries(loads.countsByKind)
        .filter(([, count]) => count > 0)
        .sort(([a, countA], [b, countB]) => countB - countA || naturalCompare(a, b))
        .map(([kind]) => kind),
    [loads.countsByKind],
  );
  const parts = useMemo(
    () =>
      loads.parts.filter(
        (part) =>
          (kinds.size === 0 || kinds.has(part.kind)) && (roles.size === 0 || roles.has(part.role)),
      ),
    [loads.parts, kinds, roles],
  );

  const table = useReactTable({
    data: parts,
    columns,
    state: { sorting },
    onSortingChange: (updater) =>
      setSorting(typeof updater === 'function' ? updater(sorting) : updater),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (part) => part.refdes,
  });
  const rows = table.getRowModel().rows;
  const shown = rows.slice(0, limit);
  const td = 'h-7 px-2 align-middle';

  return (
    <section
      id="rail-parts"
      aria-labelledby="rail-parts-title"
      className="rounded-md border border-line bg-surface"
    >
      <header className="space-y-2 border-b border-line px-3 py-2.5">
        <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
          <h2 id="rail-parts-title" className="text-sm font-semibold">
            Parts on <span className="font-mono">{net}</span>
          </h2>
          <CapacitanceLine capacitance={loads.capacitance} />
          <p className="ml-auto text-[13px] text-ink-muted" aria-live="polite">
            <Count value={parts.length} /> of{' '}
            <span className="font-mono tabular">{formatCount(loads.parts.length)}</span> parts
          </p>
        </div>
        <div className="flex flex-wrap gap-x-5 gap-y-1.5">
          <Chips
            label="Kind"
            values={kindValues}
            counts={loads.countsByKind}
            chosen={kinds}
            onChange={setKinds}
          />
          <Chips
            label="Role"
            values={loadRolesInOrder.filter((role) => (loads.countsByRole[role] ?? 0) > 0)}
            counts={loads.countsByRole}
            chosen={roles}
            onChange={setRoles}
            hint={(role) => roleHint[role]}
          />
        </div>
      </header>
      <div className="max-h-[36rem] overflow-auto">
        <table className="w-full min-w-[52rem] table-fixed border-collapse text-[13px]">
          <caption className="sr-only">Parts with a pin on {net}</caption>
          <colgroup>
            {table.getVisibleLeafColumns().map((col) => (
              <col key={col.id} className={columnWidths[col.id]} />
            ))}
          </colgroup>
          <thead className="sticky top-0 z-10 bg-raised shadow-[0_1px_0_var(--ry-line)]">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const label = flexRender(header.column.columnDef.header, header.getContext());
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={ariaSort(header)}
                      className="h-8 px-2 text-left text-xs font-medium text-ink-muted"
                    >
                      <SortableHeaderLabel header={header} label={label} />
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {shown.map(({ original: part }) => (
              <tr key={part.refdes} className="border-b border-line/70 hover:bg-raised/60">
                <td className={`${td} truncate font-mono font-medium`} title={part.refdes}>
                  <Link
                    to={paths.component.getHref(slug, part.refdes)}
                    className="text-ink hover:text-accent hover:underline"
                  >
                    {part.refdes}
                  </Link>
                </td>
                <td className={`${td} truncate text-xs text-ink-muted`}>{part.kind}</td>
                <td className={`${td} truncate font-mono`} title={part.value || undefined}>
                  {part.value || <span className="text-ink-faint">—</span>}
                </td>
                <td className={`${td} truncate text-ink-muted`} title={part.package || undefined}>
                  {part.package}
                </td>
                <td className={`${td} text-xs text-ink-muted`}>{part.side ?? ''}</td>
                <td className={`${td} text-xs`} title={roleHint[part.role]}>
                  {part.role}
                </td>
                <td className={`${td} truncate font-mono text-xs`} title={part.pins.join(', ')}>
                  {part.pins.join(', ')}
                </td>
                <td
                  className={`${td} truncate font-mono text-xs`}
                  title={part.otherNets.join(', ') || undefined}
                >
                  {part.otherNets.map((other, i) => (
                    <Fragment key={other}>
                      {i > 0 && ', '}
                      <Link
                        to={paths.net.getHref(slug, other)}
                        className="text-ink-muted hover:text-accent hover:underline"
                      >
                        {other}
                      </Link>
                    </Fragment>
                  ))}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length === 0 && (
          <p className="px-4 py-8 text-center text-sm text-ink-muted">
            {loads.parts.length === 0
              ? 'No part has a pin on this net.'
              : 'No part matches these filters.'}
          </p>
        )}
        {rows.length > shown.length && (
          <div className="flex items-center gap-3 border-t border-line px-3 py-2 text-[13px] text-ink-muted">
            <span>
              Showing {formatCount(shown.length)} of {formatCount(rows.length)}
            </span>
            <Button size="sm" onClick={() => setLimit(rows.length)}>
              Show all
            </Button>
          </div>
        )}
      </div>
    </section>
  );
}
