import { describe, expect, it } from 'vitest';
import { culpritTally } from './culprit-tally';

describe('culprits of the solved cases on a rail', () => {
  it('counts each part once per solved case, most cases first', () => {
    const tally = culpritTally([
      { outcome: 'solved', culprits: ['C10', 'C2'] },
      { outcome: 'solved', culprits: ['C10'] },
      { outcome: 'solved', culprits: ['D3', 'D3'] },
    ]);
    expect(tally).toEqual([
      { refdes: 'C10', cases: 2 },
      { refdes: 'C2', cases: 1 },
      { refdes: 'D3', cases: 1 },
    ]);
  });

  it('leaves out cases that were not solved or only partly', () => {
    expect(
      culpritTally([
        { outcome: 'not_solved', culprits: ['U1'] },
        { outcome: 'partly', culprits: ['U1'] },
      ]),
    ).toEqual([]);
  });
});
