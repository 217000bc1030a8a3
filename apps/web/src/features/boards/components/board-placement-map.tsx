// Where a part sits on the board, so a technician can find it under the microscope or the thermal
// camera: the board's outline, every part on one side as a faint box, the marked parts lit with lines
// across the board through them. Positions come from the netlist's pins (packages/board-analysis
// placement.ts); pads and bodies are not in netlists, so boxes are approximate. The bottom side is
// drawn as seen when the board is turned over left to right: mirrored, as the technician sees it.
import type { BoardBox, BoardPlacement, BoardSide } from '@railyard/shared';
import { useId, useState } from 'react';
import { ToggleButton } from '../../../components/ui/toggle-button';
import { usePlacement } from '../api/get-placement';

type PlacedPart = BoardPlacement['parts'][number];

const sideWords: Record<BoardSide, string> = {
  top: 'Top side, seen from above',
  bottom: 'Bottom side, seen from below (mirrored left to right)',
};

function formatMm(value: number): string {
  return `${Number(value.toFixed(1))} mm`;
}

/** Board millimetres (y up) to drawing units (y down), mirrored in x for the bottom side. */
function toDrawing(outline: BoardBox, side: BoardSide) {
  return (box: BoardBox) => {
    const left = side === 'top' ? box.x0 - outline.x0 : outline.x1 - box.x1;
    return { x: left, y: outline.y1 - box.y1, width: box.x1 - box.x0, height: box.y1 - box.y0 };
  };
}

/** Which of the lit parts are on the other side: named when few, counted when many. */
function elsewhere(parts: readonly PlacedPart[], side: BoardSide): string {
  const other = parts.filter((part) => part.side !== null && part.side !== side);
  if (other.length === 0) return '';
  const otherSide = side === 'top' ? 'bottom' : 'top';
  if (other.length === 1) return ` ${other[0]?.refdes} sits on the ${otherSide} side.`;
  if (other.length <= 4) {
    return ` ${other.map((part) => part.refdes).join(', ')} sit on the ${otherSide} side.`;
  }
  return ` ${other.length} of the parts sit on the ${otherSide} side.`;
}

/** The box grown about its centre to at least `size` each way, so a lit 0201 stays visible. */
function atLeast(box: { x: number; y: number; width: number; height: number }, size: number) {
  const width = Math.max(box.width, size);
  const height = Math.max(box.height, size);
  return {
    x: box.x + (box.width - width) / 2,
    y: box.y + (box.height - height) / 2,
    width,
    height,
  };
}

// at most this many lit parts get a ring each; the lines across the board are for a single part
const ringLimit = 8;

function onSide(part: PlacedPart, side: BoardSide): boolean {
  // a part of unknown side (a through-hole part, a test point without an access side) shows on both
  return part.side === null || part.side === side;
}

export function BoardPlacementMap({
  placement,
  marked,
  title = 'On the board',
}: {
  placement: BoardPlacement;
  /** refdes of the parts to light up */
  marked: readonly string[];
  title?: string;
}) {
  const titleId = useId();
  const markedSet = new Set(marked);
  const markedParts = placement.parts.filter((part) => markedSet.has(part.refdes));
  // the side most of the lit parts are on
  const onBottom = markedParts.filter((part) => part.side === 'bottom').length;
  const onTop = markedParts.filter((part) => part.side === 'top').length;
  const startSide: BoardSide = onBottom > onTop ? 'bottom' : 'top';
  const [side, setSide] = useState<BoardSide>(startSide);
  const missing = marked.filter((refdes) => placement.unplaced.includes(refdes));
  const { outline } = placement;

  let drawing = null;
  if (outline) {
    const width = outline.x1 - outline.x0;
    const height = outline.y1 - outline.y0;
    const place = toDrawing(outline, side);
    const shown = placement.parts.filter((part) => onSide(part, side));
    const lit = shown.filter((part) => markedSet.has(part.refdes));
    const margin = Math.max(width, height) * 0.02;
    const description =
      lit.length === 0
        ? `${sideWords[side]}: ${marked.length === 1 ? `${marked[0]} is` : marked.length <= 4 ? `${marked.join(', ')} are` : `none of the ${marked.length} parts is`} not on this side.`
        : lit.length > 4
          ? `${sideWords[side]}, ${formatMm(width)} by ${formatMm(height)}: ${lit.length} of the parts lit.`
          : `${sideWords[side]}, ${formatMm(width)} by ${formatMm(height)}: ${lit
              .map((part) => {
                const x = (part.x0 + part.x1) / 2;
                const y = (part.y0 + part.y1) / 2;
                return `${part.refdes} at x ${formatMm(x)}, y ${formatMm(y)}`;
              })
              .join('; ')}.`;
    drawing = (
      <svg
        role="img"
        aria-label={description}
        data-side={side}
        data-lit={lit.map((part) => part.refdes).join(' ')}
        viewBox={`${-margin} ${-margin} ${width + 2 * margin} ${height + 2 * margin}`}
        preserveAspectRatio="xMidYMid meet"
        className="block max-h-[28rem] w-full"
      >
        <rect
          x={0}
          y={0}
          width={width}
          height={height}
          rx={Math.min(width, height) * 0.02}
          className="fill-sunken stroke-line-strong"
          vectorEffect="non-scaling-stroke"
        />
        {shown.map((part) => {
          if (markedSet.has(part.refdes)) return null;
          const box = place(part);
          return (
            <rect
              key={part.refdes}
              {...box}
              className="fill-surface stroke-ink-faint"
              strokeWidth={0.5}
              vectorEffect="non-scaling-stroke"
            >
              <title>{part.refdes}</title>
            </rect>
          );
        })}
        {lit.map((part) => {
          const box = place(part);
          const cx = box.x + box.width / 2;
          const cy = box.y + box.height / 2;
          return (
            <g key={part.refdes} data-refdes={part.refdes}>
              {lit.length === 1 && (
                <>
                  <line
                    x1={0}
                    x2={width}
                    y1={cy}
                    y2={cy}
                    className="stroke-lamp"
                    strokeDasharray="4 3"
                    vectorEffect="non-scaling-stroke"
                  />
                  <line
                    x1={cx}
                    x2={cx}
                    y1={0}
                    y2={height}
                    className="stroke-lamp"
                    strokeDasharray="4 3"
                    vectorEffect="non-scaling-stroke"
                  />
                </>
              )}
              {/* a ring big enough to see on the whole board, for parts smaller than a pixel there;
                  left out where many are lit, as the rings would cover the board */}
              {lit.length <= ringLimit && (
                <circle
                  cx={cx}
                  cy={cy}
                  r={Math.max(
                    Math.hypot(box.width, box.height) / 2,
                    Math.max(width, height) * 0.025,
                  )}
                  className="fill-none stroke-lamp"
                  strokeWidth={2}
                  vectorEffect="non-scaling-stroke"
                />
              )}
              <rect
                {...atLeast(box, Math.max(width, height) * 0.012)}
                className="fill-lamp stroke-ink"
                strokeWidth={1.5}
                vectorEffect="non-scaling-stroke"
              >
                <title>{part.refdes}</title>
              </rect>
            </g>
          );
        })}
      </svg>
    );
  }

  return (
    <section aria-labelledby={titleId} className="rounded-md border border-line bg-surface">
      <header className="flex flex-wrap items-center gap-x-3 gap-y-1.5 border-b border-line px-3 py-2">
        <h2 id={titleId} className="text-sm font-semibold">
          {title}
        </h2>
        {outline && (
          <div role="group" aria-label="Side of the board" className="ml-auto flex gap-1">
            <ToggleButton pressed={side === 'top'} onClick={() => setSide('top')}>
              Top
            </ToggleButton>
            <ToggleButton pressed={side === 'bottom'} onClick={() => setSide('bottom')}>
              Bottom
            </ToggleButton>
          </div>
        )}
      </header>
      {drawing ? (
        <div className="p-3">
          {drawing}
          <p className="mt-2 text-xs leading-snug text-ink-muted">
            {sideWords[side]}. Boxes are drawn around each part’s pins from the netlist: the pads
            and bodies themselves are not in it.
            {elsewhere(markedParts, side)}
            {missing.length > 0 && ` The netlist gives no position for ${missing.join(', ')}.`}
          </p>
        </div>
      ) : (
        <p className="px-3 py-2 text-[13px] text-ink-muted">
          This board’s netlist gives no part positions.
        </p>
      )}
    </section>
  );
}

/**
 * The board's placement with `marked` lit, fetched for itself: it fills in after the rest of the page.
 * Give it a key that changes with what is marked, so the side starts again from the new parts.
 */
export function BoardPlacementPanel({
  slug,
  marked,
  title,
}: {
  slug: string;
  marked: readonly string[];
  title?: string;
}) {
  const { data, isError } = usePlacement(slug);
  if (isError) {
    return <p className="text-[13px] text-ink-muted">Could not load where the parts sit.</p>;
  }
  if (!data) {
    return (
      <p aria-busy="true" className="animate-pulse text-[13px] text-ink-muted">
        Finding the parts on the board…
      </p>
    );
  }
  return <BoardPlacementMap placement={data} marked={marked} title={title} />;
}
