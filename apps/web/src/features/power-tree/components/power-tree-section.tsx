// The power tree on a net's page: which trace to draw, collapsed subtrees, loads leaves, and the
// graph itself, whose code (cytoscape, dagre) arrives only when this section first renders.
import type { NetDetail, PowerTree } from '@railyard/shared';
import { useQueryClient } from '@tanstack/react-query';
import { lazy, Suspense, useCallback, useMemo, useRef, useState } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { Count } from '../../../components/ui/count';
import { ToggleButton } from '../../../components/ui/toggle-button';
import { formatCount } from '../../../lib/quantity-format';
import { powerTreeQueryOptions, usePowerTree, type TreeSource } from '../api/get-power-tree';
import {
  graftTrace,
  initiallyCollapsed,
  shapeOfTrace,
  traceAncestors,
  treeHighlight,
  visibleRails,
} from '../tree-elements';
import type { PowerTreeGraphHandle } from './power-tree-graph';
import { PowerTreeLegend } from './power-tree-legend';

const PowerTreeGraph = lazy(() => import('./power-tree-graph'));

/** Starts fetching the graph code early, e.g. from a route loader, alongside the data. */
export function preloadPowerTreeGraph(): void {
  void import('./power-tree-graph');
}

type View = 'root' | 'down' | 'up';

// About this many rails fit the panel at a readable size; bigger trees start collapsed.
const openRailBudget = 150;
const noChoices: ReadonlyMap<string, boolean> = new Map();

// A faint dot grid behind the transparent canvas, so panning has something to move against.
const graphBackdrop = {
  backgroundImage: 'radial-gradient(var(--ry-line) 1px, transparent 1px)',
  backgroundSize: '18px 18px',
};

function GraphPlaceholder({ text }: { text: string }) {
  return (
    <div className="absolute inset-0 grid place-items-center" aria-busy="true">
      <p className="animate-pulse text-[13px] text-ink-muted">{text}</p>
    </div>
  );
}

type PowerTreeSectionProps = {
  slug: string;
  detail: NetDetail;
  onOpenRail: (net: string) => void;
};

export function PowerTreeSection({ slug, detail, onOpenRail }: PowerTreeSectionProps) {
  const selected = detail.net.name;
  const rootNet = detail.rootNet;
  const [view, setView] = useState<View>(rootNet ? 'root' : 'down');
  const [showLoads, setShowLoads] = useState(false);
  const source: TreeSource =
    view === 'root' ? { from: 'root' } : { from: 'net', net: selected, direction: view };
  const query = usePowerTree(slug, source);
  const queryClient = useQueryClient();
  const graph = useRef<PowerTreeGraphHandle>(null);

  // Choices belong to one trace; drawing another trace starts from its own defaults.
  const base = query.data;
  const traceKey = base ? `${base.board}:${base.direction}:${base.start}` : '';
  const [grafts, setGrafts] = useState<{ key: string; traces: PowerTree[] }>({
    key: '',
    traces: [],
  });
  const [choices, setChoices] = useState<{ key: string; collapsed: Map<string, boolean> }>({
    key: '',
    collapsed: new Map(),
  });
  const [deeperError, setDeeperError] = useState<unknown>(null);

  const traces = grafts.key === traceKey ? grafts.traces : null;
  const tree = useMemo(
    () => (base ? (traces ?? []).reduce(graftTrace, base) : null),
    [base, traces],
  );
  const shape = useMemo(() => (tree ? shapeOfTrace(tree) : null), [tree]);
  const auto = useMemo(
    () => (shape ? initiallyCollapsed(shape, openRailBudget) : new Set<string>()),
    [shape],
  );
  const userChoices = choices.key === traceKey ? choices.collapsed : noChoices;

  const path = detail.upstreamPaths[0];
  const highlight = useMemo(
    () => treeHighlight(selected, path, detail.coupledGroup),
    [selected, path, detail.coupledGroup],
  );

  // A rail chosen inside a subtree that started collapsed opens its way there, and that stays
  // open afterwards, so clicking around does not fold the tree back and move everything.
  const revealKey = `${traceKey}|${selected}`;
  const [revealedFor, setRevealedFor] = useState('');
  if (shape && revealKey !== revealedFor) {
    setRevealedFor(revealKey);
    const onTheWay = [selected, ...(path ?? []).map((step) => step.net)];
    const open = new Set(onTheWay.flatMap((net) => traceAncestors(shape, net)));
    for (const net of onTheWay) if (net !== selected) open.add(net);
    const toOpen = [...open].filter((net) => auto.has(net) && !userChoices.has(net));
    if (toOpen.length > 0) {
      const next = new Map(userChoices);
      for (const net of toOpen) next.set(net, false);
      setChoices({ key: traceKey, collapsed: next });
    }
  }

  const collapsed = useMemo(() => {
    const set = new Set<string>();
    for (const net of auto) if (userChoices.get(net) !== false) set.add(net);
    for (const [net, isCollapsed] of userChoices) if (isCollapsed) set.add(net);
    return set;
  }, [auto, userChoices]);

  const toggle = useCallback(
    (net: string) => {
      const next = new Map(userChoices);
      next.set(net, !collapsed.has(net));
      setChoices({ key: traceKey, collapsed: next });
    },
    [userChoices, collapsed, traceKey],
  );

  const setAll = (isCollapsed: (net: string) => boolean) => {
    if (!shape) return;
    const next = new Map<string, boolean>();
    for (const [net, children] of shape.childrenOf) {
      if (children.length > 0) next.set(net, isCollapsed(net));
    }
    setChoices({ key: traceKey, collapsed: next });
  };
  const expandAll = () => setAll(() => false);
  const onlyTheWayHere = () => {
    if (!shape) return;
    const open = new Set([selected, ...traceAncestors(shape, selected)]);
    setAll((net) => !open.has(net));
  };

  const traceDeeper = useCallback(
    (net: string) => {
      if (!tree) return;
      setDeeperError(null);
      const key = traceKey;
      queryClient
        .fetchQuery(powerTreeQueryOptions(slug, { from: 'net', net, direction: tree.direction }))
        .then((deeper) =>
          setGrafts((current) => ({
            key,
            traces: [...(current.key === key ? current.traces : []), deeper],
          })),
        )
        .catch(setDeeperError);
    },
    [queryClient, slug, tree, traceKey],
  );

  const drawn = useMemo(
    () => (shape ? visibleRails(shape, collapsed).size : 0),
    [shape, collapsed],
  );
  const inTree = shape?.nodeByNet.has(selected) ?? false;
  const switching = query.isPlaceholderData && query.isFetching;

  return (
    <section
      aria-labelledby="power-tree-title"
      className="flex min-w-0 flex-col overflow-hidden rounded-md border border-line bg-surface"
    >
      <header className="flex flex-wrap items-center gap-x-3 gap-y-2 border-b border-line px-3 py-2">
        <h2 id="power-tree-title" className="text-sm font-semibold">
          Power tree
        </h2>
        <div role="group" aria-label="Trace to draw" className="flex flex-wrap gap-1">
          <ToggleButton
            pressed={view === 'root'}
            onClick={() => setView('root')}
            disabled={!rootNet}
            title={rootNet ? undefined : 'This board has no root net set'}
          >
            {rootNet ? `Down from ${rootNet}` : 'Down from the root'}
          </ToggleButton>
          <ToggleButton pressed={view === 'down'} onClick={() => setView('down')}>
            What this rail feeds
          </ToggleButton>
          <ToggleButton pressed={view === 'up'} onClick={() => setView('up')}>
            What feeds it
          </ToggleButton>
        </div>
        <label className="inline-flex items-center gap-1.5 text-[13px] text-ink-muted">
          <input
            type="checkbox"
            checked={showLoads}
            onChange={(event) => setShowLoads(event.target.checked)}
            className="size-3.5 accent-(--ry-accent)"
          />
          Loads as leaves
        </label>
        <div className="ml-auto flex gap-1">
          <Button size="sm" variant="ghost" onClick={expandAll} disabled={!shape}>
            Expand all
          </Button>
          <Button
            size="sm"
            variant="ghost"
            onClick={onlyTheWayHere}
            disabled={!shape || !inTree}
            title="Collapse every subtree that is not on the way to this rail"
          >
            Only the way here
          </Button>
        </div>
      </header>

      {shape && !inTree && !switching && (
        <div className="flex flex-wrap items-center gap-2 border-b border-line bg-caution-soft px-3 py-2 text-[13px]">
          <span>
            <span className="font-mono">{selected}</span> is not in this trace: no power link leads
            to it from <span className="font-mono">{shape.tree.start}</span>.
          </span>
          {view === 'root' && (
            <Button size="sm" onClick={() => setView('up')}>
              Show what feeds it
            </Button>
          )}
        </div>
      )}
      {deeperError !== null && (
        <div className="border-b border-line p-2">
          <ErrorPanel compact error={deeperError} title="Could not trace deeper" />
        </div>
      )}

      <div
        className="relative h-[min(68vh,44rem)] min-h-[26rem] bg-sunken"
        style={graphBackdrop}
        role="figure"
        aria-label={
          shape
            ? `Power tree ${view === 'up' ? 'up' : 'down'} from ${shape.tree.start}: ${formatCount(drawn)} rails drawn`
            : 'Power tree'
        }
      >
        {shape ? (
          <Suspense fallback={<GraphPlaceholder text="Loading the graph…" />}>
            <PowerTreeGraph
              ref={graph}
              shape={shape}
              highlight={highlight}
              collapsed={collapsed}
              showLoads={showLoads}
              onOpenRail={onOpenRail}
              onToggleRail={toggle}
              onTraceDeeper={traceDeeper}
              initialFocus={selected}
              className="absolute inset-0"
            />
          </Suspense>
        ) : query.isError ? (
          <div className="p-3">
            <ErrorPanel
              compact
              error={query.error}
              title="Could not trace the power tree"
              actions={
                <Button size="sm" onClick={() => void query.refetch()}>
                  Try again
                </Button>
              }
            />
          </div>
        ) : (
          <GraphPlaceholder text="Tracing the power tree…" />
        )}
        {shape && (
          <div className="absolute top-2 right-2 flex gap-1.5">
            {inTree && (
              <Button size="sm" onClick={() => graph.current?.reveal(selected)}>
                Find this rail
              </Button>
            )}
            <Button size="sm" onClick={() => graph.current?.fit()}>
              Zoom to fit
            </Button>
          </div>
        )}
        {switching && (
          <p className="absolute top-2 left-2 rounded bg-surface/90 px-2 py-1 text-xs text-ink-muted">
            Tracing…
          </p>
        )}
      </div>

      <footer className="flex flex-wrap items-start gap-x-6 gap-y-2 border-t border-line px-3 py-2">
        <PowerTreeLegend cutOff={shape?.tree.nodes.some((node) => node.truncated) ?? false} />
        {shape && (
          <p className="ml-auto text-xs text-ink-muted">
            <Count value={drawn} /> of{' '}
            <span className="font-mono tabular">{formatCount(shape.nodeByNet.size)}</span> rails
            drawn · click a rail to open it, its corner badge to fold it
          </p>
        )}
      </footer>
    </section>
  );
}
