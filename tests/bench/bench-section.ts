// One section of docs/performance.md, and the order statistics every benchmark reports.

export interface BenchSection {
  title: string;
  /** markdown body: what was measured, the numbers, the target and whether it was met */
  body: string;
  met: boolean;
}

export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** Nearest-rank percentile (the smallest value with at least p % of the values at or below it). */
export function percentile(values: readonly number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  const rank = Math.max(1, Math.ceil((p / 100) * sorted.length));
  return sorted[rank - 1]!;
}
