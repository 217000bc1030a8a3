import { describe, expect, it } from 'vitest';
import { comparePins } from './pin-order';

/** a fixed shuffle, so a failure shows the same order every run */
function shuffled<T>(items: readonly T[]): T[] {
  const out = [...items];
  let seed = 7;
  for (let i = out.length - 1; i > 0; i--) {
    seed = (seed * 48271) % 2147483647;
    const k = seed % (i + 1);
    [out[i], out[k]] = [out[k]!, out[i]!];
  }
  return out;
}

describe('natural pin order', () => {
  it('orders numbered pins by value, as a pin table counts them', () => {
    const pins = Array.from({ length: 120 }, (_, i) => String(i + 1));
    expect(shuffled(pins).sort(comparePins)).toEqual(pins);
  });

  // JEDEC JEP95 / JESD95-1 ball grid naming (from memory): rows are letters (A–H, J–N, P, R, T, U, V,
  // W, Y; I, O, Q, S, X and Z are skipped), columns are numbers from 1. A datasheet lists balls row by
  // row, columns counted up within a row. (Grids past row Y go on AA, AB, …, which this order puts
  // after A, not after Y.)
  it('reads a ball grid row by row, columns by value', () => {
    const rows = ['A', 'B', 'C', 'H', 'J', 'N', 'P', 'Y'];
    const grid = rows.flatMap((row) => Array.from({ length: 12 }, (_, c) => `${row}${c + 1}`));
    expect(shuffled(grid).sort(comparePins)).toEqual(grid);
  });

  it('puts ports and their bits in numeric order', () => {
    const pins = ['P1.1', 'P1.2', 'P1.10', 'P2.1', 'P2.9', 'P10.0'];
    expect(shuffled(pins).sort(comparePins)).toEqual(pins);
  });

  it('ignores letter case but still orders names that differ only in case, the same way every time', () => {
    expect(Math.sign(comparePins('a2', 'A10'))).toBe(-1);
    expect(comparePins('a1', 'A1')).not.toBe(0);
    expect(comparePins('a1', 'A1')).toBe(-comparePins('A1', 'a1'));
    expect(comparePins('01', '1')).not.toBe(0);
    expect(comparePins('B2', 'B2')).toBe(0);
  });
});
