import { describe, expect, it } from 'vitest';
import { boardPlacement, padMargin, partBox, type PlacementInput } from './placement';

function part(
  refdes: string,
  pins: [number | null, number | null][],
  centre: [number | null, number | null] = [null, null],
): PlacementInput {
  return {
    refdes,
    kind: 'resistor',
    side: 'top',
    x: centre[0],
    y: centre[1],
    pins: pins.map(([x, y]) => ({ x, y })),
  };
}

// Worked by hand: the box is the pins' extent widened by the pad margin (0.25 mm) on every side.
describe('partBox', () => {
  it('draws a two-pin chip as the rectangle around its pin centres, widened by half a pad', () => {
    // an 0402 chip: pad centres about 0.5 mm apart along x (FACTS §4: 1.0 × 0.5 mm body)
    expect(
      partBox(
        part('R1', [
          [10, 5],
          [10.5, 5],
        ]),
      ),
    ).toEqual({ x0: 9.75, y0: 4.75, x1: 10.75, y1: 5.25 });
  });

  it('takes the extent of every pin of a part, whatever their order', () => {
    const box = partBox(
      part('U1', [
        [3, 9],
        [1, 2],
        [7, 4],
        [2, 8],
      ]),
    );
    expect(box).toEqual({
      x0: 1 - padMargin,
      y0: 2 - padMargin,
      x1: 7 + padMargin,
      y1: 9 + padMargin,
    });
  });

  it('falls back to the part’s centre when no pin has a position, as one pad square', () => {
    expect(partBox(part('TP1', [[null, null]], [4, 4]))).toEqual({
      x0: 3.75,
      y0: 3.75,
      x1: 4.25,
      y1: 4.25,
    });
  });

  it('leaves no binary rounding tail on positions read from a netlist', () => {
    // 1.11 − 0.25 is 0.8600000000000001 in binary floating point
    expect(partBox(part('C2', [[1.11, 1.11]]))).toEqual({ x0: 0.86, y0: 0.86, x1: 1.36, y1: 1.36 });
  });

  it('ignores pins with half a position and has no box for a part with no position at all', () => {
    expect(
      partBox(
        part('C1', [
          [2, null],
          [1, 1],
        ]),
      ),
    ).toEqual({ x0: 0.75, y0: 0.75, x1: 1.25, y1: 1.25 });
    expect(partBox(part('H1', [[null, null]]))).toBeNull();
  });
});

describe('boardPlacement', () => {
  it('outlines the board around every placed part and lists the parts it could not place', () => {
    const placement = boardPlacement([
      part('R1', [
        [10, 5],
        [10.5, 5],
      ]),
      part('H1', []),
      part('U1', [
        [0, 0],
        [20, 12],
      ]),
    ]);

    expect(placement.outline).toEqual({ x0: -0.25, y0: -0.25, x1: 20.25, y1: 12.25 });
    expect(placement.parts.map((p) => p.refdes)).toEqual(['R1', 'U1']);
    expect(placement.unplaced).toEqual(['H1']);
  });

  it('has no outline for a board without positions', () => {
    expect(boardPlacement([part('R1', [[null, null]])])).toEqual({
      outline: null,
      parts: [],
      unplaced: ['R1'],
    });
  });
});
