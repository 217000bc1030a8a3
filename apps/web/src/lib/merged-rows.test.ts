import { describe, expect, it } from 'vitest';
import { mergedRowKinds, mergedRowsText } from './merged-rows';

const noneOf = (kinds: readonly string[]) => Object.fromEntries(kinds.map((kind) => [kind, 0]));

describe('what a merge moved, in words', () => {
  it('lists the kinds that moved, one or many, in the order given, and skips the rest', () => {
    expect(mergedRowsText({ nets: 0, readings: 3, comments: 1, votes: 2 })).toBe(
      '3 readings, 1 comment, 2 votes',
    );
    expect(mergedRowsText({ nets: 2, components: 0, attachments: 1 })).toBe(
      '2 net links, 1 photo or file',
    );
  });

  it('counts the row ids an audit entry records as well as counts', () => {
    expect(mergedRowsText({ comments: [1, 2], attachments: 1 })).toBe(
      '2 comments, 1 photo or file',
    );
  });

  it('says nothing moved when every count is zero, or when there are no counts at all', () => {
    expect(mergedRowsText(noneOf(mergedRowKinds))).toBe('nothing');
    expect(mergedRowsText(null)).toBe('nothing');
  });

  it('still counts a kind of row it has no words for, by the name it came with', () => {
    expect(mergedRowsText({ readings: 1, tags: [4] })).toBe('1 reading, 1 tags');
  });
});
