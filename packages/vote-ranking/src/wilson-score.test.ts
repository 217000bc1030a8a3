import jStat from 'jstat';
import wilson from 'wilson-score';
import { describe, expect, it } from 'vitest';
import { wilsonLowerBound, z95 } from './wilson-score';

// Check values from shared/reference/FACTS.md §6, worked out at z = 1.959964 [calc] (Wilson 1927,
// as popularised by E. Miller, "How Not To Sort By Average Rating", 2009), six decimals.
const workedExample: [up: number, down: number, lowerBound: number][] = [
  [10, 2, 0.551969],
  [1, 0, 0.206549],
  [3, 0, 0.438503],
  [5, 5, 0.236593],
  [30, 10, 0.59806],
  [100, 20, 0.756547],
];

describe('Wilson score lower bound', () => {
  it('uses the two-sided 95 % z that jStat computes as the normal quantile at 0.975', () => {
    // jstat (npm), jStat.normal.inv(0.975, 0, 1) = 1.95996398454005…
    expect(z95).toBeCloseTo(jStat.normal.inv(0.975, 0, 1), 12);
  });

  it.each(workedExample)('gives the worked-example value for %i up and %i down', (up, down, expected) => {
    expect(wilsonLowerBound(up, down)).toBeCloseTo(expected, 6);
  });

  it.each([
    [10, 2],
    [1, 0],
    [7, 3],
    [2, 9],
    [250, 4],
    [1, 1],
    [13, 0],
  ])('agrees with the wilson-score npm library for %i up and %i down when given the same z', (up, down) => {
    // wilson-score (npm) takes (up, total, z); its default z (2.326348) and its "95 %" hint
    // (1.644853) are one-sided values, so z is passed explicitly
    expect(wilsonLowerBound(up, down)).toBeCloseTo(wilson(up, up + down, z95), 12);
  });

  it('is 0 with no votes and with only down-votes', () => {
    // FACTS.md §6: "0 up → 0; no votes → 0 by convention"
    expect(wilsonLowerBound(0, 0)).toBe(0);
    expect(wilsonLowerBound(0, 5)).toBe(0);
    expect(wilson(0, 5, z95)).toBeCloseTo(0, 12);
  });

  it('ranks 10 up and 2 down above a single up-vote, whose average of 100 % says little', () => {
    expect(wilsonLowerBound(10, 2)).toBeGreaterThan(wilsonLowerBound(1, 0));
  });

  it('stays below the share of up-votes and rises towards it as votes accumulate', () => {
    const small = wilsonLowerBound(8, 2);
    const large = wilsonLowerBound(800, 200);
    expect(small).toBeLessThan(0.8);
    expect(large).toBeLessThan(0.8);
    expect(large).toBeGreaterThan(small);
  });

  it('refuses negative or fractional counts and a z that is not positive', () => {
    expect(() => wilsonLowerBound(-1, 2)).toThrow(/up must be a whole number/);
    expect(() => wilsonLowerBound(1, 0.5)).toThrow(/down must be a whole number/);
    expect(() => wilsonLowerBound(1, 1, 0)).toThrow(/z must be a positive number/);
  });
});
