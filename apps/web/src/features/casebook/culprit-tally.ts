// Which parts were at fault in the solved cases of a list: on a rail's page, the parts to suspect first.
import type { CaseSummary } from '@railyard/shared';
import { naturalCompare } from '../../lib/natural-order';

export type CulpritCount = { refdes: string; cases: number };

/** Culprits of solved cases, most cases first, then in designator order (C2 before C10). */
export function culpritTally(cases: readonly Pick<CaseSummary, 'outcome' | 'culprits'>[]) {
  const counts = new Map<string, number>();
  for (const found of cases) {
    if (found.outcome !== 'solved') continue;
    for (const refdes of new Set(found.culprits)) counts.set(refdes, (counts.get(refdes) ?? 0) + 1);
  }
  return [...counts]
    .map(([refdes, count]): CulpritCount => ({ refdes, cases: count }))
    .sort((a, b) => b.cases - a.cases || naturalCompare(a.refdes, b.refdes));
}
