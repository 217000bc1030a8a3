// Where each part sits on the board, for a drawing that lets a technician find it under the camera or
// the microscope. Netlists give pin positions (IPC-D-356 test points, pin-list CSV) and sometimes a
// part's centre; pad and body sizes are not in them. So a part is drawn as the rectangle around its
// pins' centres, widened by half a pad on every side, and a part with one known point as a square of
// one pad around it. All in millimetres, as Railyard stores positions.

export type BoardSide = 'top' | 'bottom';

export interface PlacementInput<Kind extends string = string> {
  refdes: string;
  kind: Kind;
  side: BoardSide | null;
  x: number | null;
  y: number | null;
  pins: readonly { x: number | null; y: number | null }[];
}

export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export interface PlacedPart<Kind extends string = string> extends Box {
  refdes: string;
  kind: Kind;
  side: BoardSide | null;
}

export interface Placement<Kind extends string = string> {
  /** the box around every placed part; null when no part has a position */
  outline: Box | null;
  parts: PlacedPart<Kind>[];
  /** refdes of parts with no position at all, in input order */
  unplaced: string[];
}

/** Half the side of the smallest pad drawn, mm: about the pad of an 0402 chip (FACTS §4: 1.0 × 0.5 mm). */
export const padMargin = 0.25;

/**
 * Rounded to 0.0001 mm, finer than any netlist unit (IPC-D-356: 0.001 mm or 0.0001 in = 2.54 µm), so
 * the sums leave no binary tail such as 0.8600000000000001.
 */
function toTenthMicron(mm: number): number {
  return Math.round(mm * 10_000) / 10_000;
}

function known(point: { x: number | null; y: number | null }): point is { x: number; y: number } {
  return (
    point.x !== null && point.y !== null && Number.isFinite(point.x) && Number.isFinite(point.y)
  );
}

/** The rectangle a part is drawn as, or null when neither its pins nor its centre have a position. */
export function partBox(part: PlacementInput): Box | null {
  const points = part.pins.filter(known);
  if (points.length === 0 && known(part)) points.push({ x: part.x, y: part.y });
  if (points.length === 0) return null;
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  return {
    x0: toTenthMicron(Math.min(...xs) - padMargin),
    y0: toTenthMicron(Math.min(...ys) - padMargin),
    x1: toTenthMicron(Math.max(...xs) + padMargin),
    y1: toTenthMicron(Math.max(...ys) + padMargin),
  };
}

export function boardPlacement<Kind extends string>(
  parts: readonly PlacementInput<Kind>[],
): Placement<Kind> {
  const placed: PlacedPart<Kind>[] = [];
  const unplaced: string[] = [];
  for (const part of parts) {
    const box = partBox(part);
    if (box) placed.push({ refdes: part.refdes, kind: part.kind, side: part.side, ...box });
    else unplaced.push(part.refdes);
  }
  if (placed.length === 0) return { outline: null, parts: placed, unplaced };
  const outline = placed.reduce<Box>(
    (box, p) => ({
      x0: Math.min(box.x0, p.x0),
      y0: Math.min(box.y0, p.y0),
      x1: Math.max(box.x1, p.x1),
      y1: Math.max(box.y1, p.y1),
    }),
    { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity },
  );
  return { outline, parts: placed, unplaced };
}
