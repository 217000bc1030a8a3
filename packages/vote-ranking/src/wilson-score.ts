// Ranking by votes: the lower bound of the Wilson score interval for the share of positive votes.
// E. B. Wilson (1927), "Probable inference, the law of succession, and statistical inference", JASA 22;
// used for ranking since E. Miller, "How Not To Sort By Average Rating" (2009). A case with 10 up and
// 2 down outranks one with 1 up and 0 down: the bound asks "how good is it at least, with 95 % confidence".

/** Standard normal quantile at 0.975: the two-sided 95 % z. */
export const z95 = 1.959963984540054;

function requireCount(value: number, name: string): void {
  if (!Number.isInteger(value) || value < 0) throw new RangeError(`${name} must be a whole number ≥ 0, got ${value}`);
}

/**
 * LB = (p̂ + z²/2n − z·√(p̂(1−p̂)/n + z²/4n²)) / (1 + z²/n), with p̂ = up/n and n = up + down.
 * No votes gives 0 by convention; no up-votes gives exactly 0 (the formula's two terms cancel).
 */
export function wilsonLowerBound(up: number, down: number, z: number = z95): number {
  requireCount(up, 'up');
  requireCount(down, 'down');
  if (!(z > 0) || !Number.isFinite(z)) throw new RangeError(`z must be a positive number, got ${z}`);
  const n = up + down;
  if (n === 0 || up === 0) return 0;
  const p = up / n;
  const z2 = z * z;
  return (p + z2 / (2 * n) - z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n))) / (1 + z2 / n);
}
