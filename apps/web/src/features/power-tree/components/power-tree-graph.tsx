// The power tree drawn with cytoscape and laid out top to bottom by dagre. This module is the
// only one that imports them, and it is loaded on demand, so no other page carries the graph code.
//
// Layout runs only when the set of drawn elements changes (collapse, expand, loads on or off, a
// new trace). Moving the selection changes classes only: the graph re-lights in place.
import cytoscape, { type Core, type NodeSingular } from 'cytoscape';
import dagre, { type DagreLayoutOptions } from 'cytoscape-dagre';
import {
  useCallback,
  useEffect,
  useImperativeHandle,
  useLayoutEffect,
  useMemo,
  useRef,
  type Ref,
} from 'react';
import CytoscapeComponent from 'react-cytoscapejs';
import { useTheme } from '../../../lib/theme';
import { graphStylesheet, readGraphTokens } from '../graph-style';
import {
  buildTreeElements,
  highlightElements,
  loadsElementId,
  loadsGap,
  railElementId,
  type TraceShape,
  type TreeHighlight,
} from '../tree-elements';

cytoscape.use(dagre);

/** Imperative controls for the buttons drawn over the graph. */
export type PowerTreeGraphHandle = {
  /** Zoom so the whole drawing fits. */
  fit(): void;
  /** Pan to a rail, zooming in to a readable size if needed. */
  reveal(net: string): void;
};

export type GraphTiming = {
  /** elements drawn (rails, markers, loads leaves, links) */
  elements: number;
  rails: number;
  /** dagre alone */
  layoutMs: number;
  /** from the start of the layout to the end of the first frame drawn with it */
  paintedMs: number;
};

export type PowerTreeGraphProps = {
  shape: TraceShape;
  highlight: TreeHighlight;
  collapsed: ReadonlySet<string>;
  showLoads: boolean;
  /** A rail (or its loads leaf) was clicked. */
  onOpenRail: (net: string) => void;
  /** The "+n" / "−" marker of a rail was clicked. */
  onToggleRail: (net: string) => void;
  /** The marker of a rail the depth limit cut off was clicked. */
  onTraceDeeper?: (net: string) => void;
  /** Called after every layout; a benchmark can mount this component and read it. */
  onLaidOut?: (timing: GraphTiming) => void;
  /** Read once, at mount: the rail to centre on when the tree is too big to fit readably. */
  initialFocus?: string | null;
  ref?: Ref<PowerTreeGraphHandle>;
  className?: string;
};

// Below this zoom the 12 px labels are too small to read, so a big tree opens zoomed in on the
// selected rail instead of fitted; "Zoom to fit" still shows the whole of it.
const readableZoom = 0.85;
const largestZoom = 1.3;
const fitPadding = 28;

const layoutOptions: DagreLayoutOptions = {
  name: 'dagre',
  rankDir: 'TB',
  nodeSep: 18,
  rankSep: 46,
  edgeSep: 10,
  fit: false,
  animate: false,
};

function prefersReducedMotion(): boolean {
  return matchMedia('(prefers-reduced-motion: reduce)').matches;
}

/** The "+n" markers sit on the bottom-right corner of their rail and take no part in the layout. */
function placeMarkers(cy: Core) {
  cy.nodes('.marker').forEach((marker) => {
    const rail = cy.getElementById(railElementId(marker.data('net') as string));
    if (rail.empty()) return;
    const at = rail.position();
    marker.position({ x: at.x + rail.width() / 2 - 4, y: at.y + rail.height() / 2 });
  });
}

function fitReadable(cy: Core, focus: NodeSingular | null) {
  cy.fit(undefined, fitPadding);
  if (cy.zoom() > largestZoom) {
    cy.zoom(largestZoom);
    cy.center();
  } else if (cy.zoom() < readableZoom) {
    cy.zoom(readableZoom);
    if (focus) {
      cy.center(focus);
    } else {
      // No rail to centre on: show the top of the tree, where the root is.
      const box = cy.elements().boundingBox();
      cy.pan({
        x: cy.width() / 2 - (box.x1 + box.w / 2) * readableZoom,
        y: fitPadding - box.y1 * readableZoom,
      });
    }
  }
}

// The canvas has no DOM of its own to query, so its container carries a plain description of
// the drawing: each rail drawn with its model position, the rails lit, and the viewport that maps
// model positions to the screen (x · zoom + pan). Browser tests read it; it costs one string per
// layout or highlight change, and a tiny one per viewport change.
function describeDrawing(cy: Core, element: HTMLElement) {
  const rails: Record<string, [number, number]> = {};
  cy.nodes('.rail').forEach((node) => {
    const { x, y } = node.position();
    rails[node.data('net') as string] = [Math.round(x), Math.round(y)];
  });
  element.dataset.rails = JSON.stringify(rails);
  element.dataset.selectedRail =
    (cy.nodes('.rail.selected').first().data('net') as string | undefined) ?? '';
  element.dataset.pathRails = JSON.stringify(cy.nodes('.rail.on-path').map((n) => n.data('net')));
}

function describeViewport(cy: Core, element: HTMLElement) {
  const { x, y } = cy.pan();
  element.dataset.viewport = JSON.stringify({ zoom: cy.zoom(), x, y });
}

export function PowerTreeGraph({
  shape,
  highlight,
  collapsed,
  showLoads,
  onOpenRail,
  onToggleRail,
  onTraceDeeper,
  onLaidOut,
  initialFocus = null,
  ref,
  className,
}: PowerTreeGraphProps) {
  const [theme] = useTheme();
  const structure = useMemo(
    () => buildTreeElements(shape, { collapsed, showLoads }),
    [shape, collapsed, showLoads],
  );
  const elements = useMemo(() => highlightElements(structure, highlight), [structure, highlight]);
  // Re-read on every theme change: the variables behind the tokens change with data-theme.
  const stylesheet = useMemo(() => graphStylesheet(readGraphTokens(), theme), [theme]);

  const cyRef = useRef<Core | null>(null);
  const laidOut = useRef<{ cy: Core; structure: unknown; shape: TraceShape } | null>(null);
  // The rail whose marker was clicked: it stays where it was on screen through the new layout.
  const anchor = useRef<string | null>(null);
  const focus = useRef(initialFocus);
  // The canvas handlers are bound once per instance and call whatever the props are now.
  const callbacks = useRef({ onOpenRail, onToggleRail, onTraceDeeper, onLaidOut });
  useLayoutEffect(() => {
    callbacks.current = { onOpenRail, onToggleRail, onTraceDeeper, onLaidOut };
  });
  const wrapper = useRef<HTMLDivElement>(null);

  const layOut = useCallback(
    (cy: Core) => {
      const previous = laidOut.current;
      if (previous?.cy === cy && previous.structure === structure) return;
      laidOut.current = { cy, structure, shape };
      // Same trace redrawn (folded, unfolded, loads on or off): the clicked rail, or else the
      // selected one, keeps its place on screen. A new trace is framed afresh.
      const sameTrace = previous?.cy === cy && previous.shape === shape;
      const anchorNet = anchor.current ?? (sameTrace ? focus.current : null);
      const anchorNode = anchorNet ? cy.getElementById(railElementId(anchorNet)) : null;
      // A rail that was not drawn before has no place yet to keep.
      const anchorBefore =
        anchorNode?.nonempty() && anchorNode.scratch('placed')
          ? { ...anchorNode.renderedPosition() }
          : null;
      anchor.current = null;

      const start = performance.now();
      // A rail with a loads leaf is laid out as one block as wide as both, then split again.
      cy.batch(() => cy.nodes('.has-loads').addClass('layout-block'));
      cy.elements().not('.marker, .loads, .loads-link').layout(layoutOptions).run();
      cy.batch(() => {
        cy.nodes('.has-loads').forEach((rail) => {
          rail.removeClass('layout-block');
          const width = rail.data('w') as number;
          const left = rail.position('x') - (rail.data('blockWidth') as number) / 2;
          const y = rail.position('y');
          rail.position({ x: left + width / 2, y });
          const leaf = cy.getElementById(loadsElementId(rail.data('net') as string));
          leaf.position({ x: left + width + loadsGap + (leaf.data('w') as number) / 2, y });
        });
      });
      placeMarkers(cy);
      cy.nodes().forEach((node) => void node.scratch('placed', true));
      const layoutMs = performance.now() - start;

      if (anchorNode && anchorBefore && anchorNode.inside()) {
        const after = anchorNode.renderedPosition();
        cy.panBy({ x: anchorBefore.x - after.x, y: anchorBefore.y - after.y });
      } else {
        const focusNode = focus.current ? cy.getElementById(railElementId(focus.current)) : null;
        fitReadable(cy, focusNode?.nonempty() ? focusNode : null);
      }
      const rails = cy.nodes('.rail').length;
      const count = cy.elements().length;
      cy.one('render', () => {
        const paintedMs = performance.now() - start;
        // Named entries a benchmark (or the browser's performance panel) can read.
        performance.measure('railyard:power-tree-layout', { start, duration: layoutMs });
        performance.measure('railyard:power-tree-paint', { start, duration: paintedMs });
        callbacks.current.onLaidOut?.({ elements: count, rails, layoutMs, paintedMs });
      });
    },
    [structure, shape],
  );

  // react-cytoscapejs hands over its instance after every update; a new instance (first mount,
  // or a remount in development) gets the event handlers and a layout.
  const onCy = useCallback(
    (cy: Core) => {
      if (cyRef.current === cy) return;
      cyRef.current = cy;
      cy.on('tap', 'node.rail, node.loads', (event) => {
        callbacks.current.onOpenRail(event.target.data('net') as string);
      });
      cy.on('tap', 'node.marker', (event) => {
        const net = event.target.data('net') as string;
        if (event.target.hasClass('deeper')) {
          callbacks.current.onTraceDeeper?.(net);
          return;
        }
        anchor.current = net;
        callbacks.current.onToggleRail(net);
      });
      const container = cy.container();
      cy.on('viewport', () => {
        if (wrapper.current) describeViewport(cy, wrapper.current);
      });
      cy.on('mouseover', 'node', (event) => {
        if (!container) return;
        const net = event.target.data('net') as string;
        container.style.cursor = 'pointer';
        container.title = event.target.hasClass('marker')
          ? event.target.hasClass('deeper')
            ? `Trace deeper below ${net}`
            : event.target.hasClass('collapsed')
              ? `Show what ${net} feeds`
              : `Hide what ${net} feeds`
          : `Open ${net}`;
      });
      cy.on('mouseout', 'node', () => {
        if (!container) return;
        container.style.cursor = '';
        container.title = '';
      });
      // The canvas was drawn with a fallback face if the mono font was not loaded yet.
      void document.fonts?.load(`12px "JetBrains Mono"`).then(() => {
        if (!cy.destroyed()) cy.style().update();
      });
      layOut(cy);
    },
    [layOut],
  );

  useLayoutEffect(() => {
    if (cyRef.current && !cyRef.current.destroyed()) layOut(cyRef.current);
  }, [layOut]);

  // After cytoscape has patched in the new elements (a child's updates run before this effect).
  useEffect(() => {
    const cy = cyRef.current;
    if (!cy || cy.destroyed() || !wrapper.current) return;
    describeDrawing(cy, wrapper.current);
    describeViewport(cy, wrapper.current);
  }, [elements]);

  // Another rail selected from outside (search, a link): bring it into view if it is off screen.
  useEffect(() => {
    const cy = cyRef.current;
    if (!cy || !highlight.selected) return;
    focus.current = highlight.selected;
    const node = cy.getElementById(railElementId(highlight.selected));
    if (node.empty()) return;
    const view = cy.extent();
    const box = node.boundingBox();
    const inView = box.x1 >= view.x1 && box.x2 <= view.x2 && box.y1 >= view.y1 && box.y2 <= view.y2;
    if (inView) return;
    cy.animate({ center: { eles: node } }, { duration: prefersReducedMotion() ? 0 : 250 });
  }, [highlight.selected]);

  // The canvas does not follow its container's size by itself (only the window's).
  useEffect(() => {
    const element = wrapper.current;
    if (!element) return;
    const observer = new ResizeObserver(() => cyRef.current?.resize());
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  useImperativeHandle(
    ref,
    () => ({
      fit() {
        const cy = cyRef.current;
        if (!cy) return;
        cy.animate(
          { fit: { eles: cy.elements(), padding: fitPadding } },
          { duration: prefersReducedMotion() ? 0 : 200 },
        );
      },
      reveal(net) {
        const cy = cyRef.current;
        const node = cy?.getElementById(railElementId(net));
        if (!cy || !node || node.empty()) return;
        cy.animate(
          { center: { eles: node }, zoom: Math.max(cy.zoom(), 1) },
          { duration: prefersReducedMotion() ? 0 : 250 },
        );
      },
    }),
    [],
  );

  return (
    <div ref={wrapper} className={className}>
      <CytoscapeComponent
        elements={elements}
        stylesheet={stylesheet}
        cy={onCy}
        // cytoscape injects one style rule for its container; the container is positioned here
        // too, so the drawing is right even where that rule is blocked.
        style={{ position: 'relative', width: '100%', height: '100%' }}
        minZoom={0.1}
        maxZoom={3}
        boxSelectionEnabled={false}
        autounselectify
        autoungrabify
      />
    </div>
  );
}

export default PowerTreeGraph;
