// The board page's working area: filter, the nets table and the selected net's components.
// The selected net lives in the URL (?net=) so a reload or a shared link opens the same net.
import type { NetKind, NetRow } from '@railyard/shared';
import type { SortingState } from '@tanstack/react-table';
import { useCallback, useDeferredValue, useEffect, useMemo, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { netKindOrder } from '../../../components/ui/net-kind-badge';
import { toggled } from '../../../lib/toggled';
import { useNets } from '../api/get-nets';
import { netMatcher } from '../net-search';
import { NetComponentsPanel } from './net-components-panel';
import { NetFilterBar } from './net-filter-bar';
import { netRowsPerPage, NetsTable } from './nets-table';

// Rails first: power and ground nets are what a fault hunt starts from.
const defaultSorting: SortingState = [{ id: 'kind', desc: false }];

export function BoardNets({ slug }: { slug: string }) {
  const { data } = useNets(slug);
  const nets = data.nets;
  const [searchParams, setSearchParams] = useSearchParams();
  const selectedName = searchParams.get('net');

  const [text, setText] = useState('');
  const [kinds, setKinds] = useState<ReadonlySet<NetKind>>(new Set());
  const [sorting, setSorting] = useState<SortingState>(defaultSorting);
  const [limit, setLimit] = useState(netRowsPerPage);
  // Typing stays responsive on a 5,000-net board: the table catches up a frame later.
  const deferredText = useDeferredValue(text);

  const textMatches = useMemo(() => {
    const matches = netMatcher({ text: deferredText, kinds: new Set() });
    return nets.filter(matches);
  }, [nets, deferredText]);

  const kindCounts = useMemo(() => {
    const counts = Object.fromEntries(netKindOrder.map((kind) => [kind, 0])) as Record<
      NetKind,
      number
    >;
    for (const net of textMatches) counts[net.kind] += 1;
    return counts;
  }, [textMatches]);

  const visible = useMemo(
    () => (kinds.size === 0 ? textMatches : textMatches.filter((net) => kinds.has(net.kind))),
    [textMatches, kinds],
  );

  // A new filter or order starts again from the first page of rows.
  useEffect(() => setLimit(netRowsPerPage), [deferredText, kinds, sorting]);

  const byName = useMemo(() => new Map(nets.map((net) => [net.name, net])), [nets]);
  const selected: NetRow | null = selectedName ? (byName.get(selectedName) ?? null) : null;

  const select = useCallback(
    (name: string | null) => {
      setSearchParams(
        (params) => {
          const next = new URLSearchParams(params);
          if (name) next.set('net', name);
          else next.delete('net');
          return next;
        },
        // Walking the list with the arrow keys must not fill the back button's history.
        { replace: true, preventScrollReset: true },
      );
    },
    [setSearchParams],
  );

  useEffect(() => {
    if (!selectedName) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape' && !event.defaultPrevented) select(null);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [selectedName, select]);

  const toggleKind = useCallback((kind: NetKind) => {
    setKinds((current) => {
      const next = toggled(current, kind);
      // Every kind on is the same as no kind filter; show it as "All".
      return next.size === netKindOrder.length ? new Set() : next;
    });
  }, []);

  return (
    <section aria-label="Nets" className="px-4 pt-3 pb-6">
      <NetFilterBar
        text={text}
        onTextChange={setText}
        kinds={kinds}
        onToggleKind={toggleKind}
        onClearKinds={() => setKinds(new Set())}
        kindCounts={kindCounts}
        matched={visible.length}
        total={nets.length}
      />
      <div className="mt-2.5 grid items-start gap-3 lg:grid-cols-[minmax(0,1fr)_30rem] xl:grid-cols-[minmax(0,1fr)_34rem] 2xl:grid-cols-[minmax(0,1fr)_40rem]">
        <NetsTable
          slug={slug}
          nets={visible}
          sorting={sorting}
          onSortingChange={setSorting}
          selected={selectedName}
          onSelect={select}
          limit={limit}
          onLimitChange={setLimit}
        />
        <div className="lg:sticky lg:top-14">
          <NetComponentsPanel slug={slug} net={selected} onClose={() => select(null)} />
        </div>
      </div>
    </section>
  );
}
