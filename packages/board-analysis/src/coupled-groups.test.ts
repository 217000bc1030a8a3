import { describe, expect, it } from 'vitest';
import { seriesGroups } from './coupled-groups';

describe('seriesGroups', () => {
  it('puts every net in a group of its own when there are no series links', () => {
    const { groupOf, groupCount } = seriesGroups(3, []);

    expect([...groupOf]).toEqual([0, 1, 2]);
    expect(groupCount).toBe(3);
  });

  it('joins a chain of series links into one group whichever way each link points', () => {
    // 0 → 1 → 2 and 3 → 2: all one rail; 4 stands alone
    const { groupOf, groupCount } = seriesGroups(5, [
      { from: 0, to: 1 },
      { from: 1, to: 2 },
      { from: 3, to: 2 },
    ]);

    expect([...groupOf]).toEqual([0, 0, 0, 0, 1]);
    expect(groupCount).toBe(2);
  });

  it('numbers groups by the lowest net in them', () => {
    const { groupOf } = seriesGroups(5, [
      { from: 4, to: 1 },
      { from: 3, to: 0 },
    ]);

    expect([...groupOf]).toEqual([0, 1, 2, 0, 1]);
  });

  it('keeps a loop of series links to one group', () => {
    const { groupOf, groupCount } = seriesGroups(3, [
      { from: 0, to: 1 },
      { from: 1, to: 2 },
      { from: 2, to: 0 },
      { from: 1, to: 1 },
    ]);

    expect([...groupOf]).toEqual([0, 0, 0]);
    expect(groupCount).toBe(1);
  });

  it('rejects a link to a net that does not exist, naming it', () => {
    expect(() => seriesGroups(2, [{ from: 0, to: 2 }])).toThrow(
      'series link 0 → 2 names a net outside 0…1',
    );
  });
});
