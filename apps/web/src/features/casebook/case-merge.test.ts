import type { CaseMergeCounts } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import {
  caseNumberIn,
  mergeCandidates,
  mergedNoticeOf,
  mergedRedirectHref,
  mergeOutcomeFrom,
  mergeOutcomeState,
} from './case-merge';

const board = (slug: string) => ({ slug, title: slug });
const listed = (id: number, slug = 'kestrel-mb-2210') => ({ id, board: board(slug) });

describe('the page of a merged case', () => {
  it('stays where it is when the API answered with the case asked for', () => {
    expect(mergedRedirectHref(12, { id: 12 })).toBeNull();
  });

  it('moves to the kept case and names the duplicate when the API answered with another case', () => {
    expect(mergedRedirectHref(12, { id: 30 })).toBe('/cases/30?mergedFrom=12');
  });

  it('tells the reader which case was merged here, with its title', () => {
    const notice = mergedNoticeOf(new URLSearchParams('mergedFrom=12'), {
      id: 30,
      mergedFrom: [
        { id: 14, title: 'Other' },
        { id: 12, title: 'No boot after a drop' },
      ],
    });
    expect(notice).toEqual({ id: 12, title: 'No boot after a drop' });
  });

  it('shows no notice for an id the case does not list as merged into it', () => {
    const shown = { id: 30, mergedFrom: [{ id: 14, title: 'Other' }] };
    expect(mergedNoticeOf(new URLSearchParams('mergedFrom=12'), shown)).toBeNull();
    expect(mergedNoticeOf(new URLSearchParams('mergedFrom=abc'), shown)).toBeNull();
    expect(mergedNoticeOf(new URLSearchParams(''), shown)).toBeNull();
    expect(mergedNoticeOf(new URLSearchParams('mergedFrom=14'), { id: 30 })).toBeNull();
  });
});

describe('picking the case to keep', () => {
  it('reads a typed case number with or without the hash', () => {
    expect(caseNumberIn('12')).toBe(12);
    expect(caseNumberIn(' #12 ')).toBe(12);
    expect(caseNumberIn('12 V rail')).toBeNull();
    expect(caseNumberIn('#0')).toBeNull();
    expect(caseNumberIn('9999999999')).toBeNull();
  });

  it('offers each case once, first list first, never the duplicate itself', () => {
    const found = mergeCandidates(listed(5), [
      [listed(7), listed(5)],
      [listed(9), listed(7)],
    ]);
    expect(found.map((c) => c.id)).toEqual([7, 9]);
  });

  it('leaves out cases of another board and lists that are not in yet', () => {
    const found = mergeCandidates(listed(5), [undefined, [listed(8, 'other-board'), listed(3)]]);
    expect(found.map((c) => c.id)).toEqual([3]);
  });
});

const none: CaseMergeCounts = {
  nets: 0,
  components: 0,
  readings: 0,
  attachments: 0,
  comments: 0,
  confirmations: 0,
  votes: 0,
};

describe('the merge handed to the kept case’s page', () => {
  const summary = {
    auditId: 81,
    fromCaseId: 12,
    intoCaseId: 30,
    moved: { ...none, comments: 2 },
    keptOnDuplicate: { ...none, votes: 1 },
  };

  it('is read back on the kept case’s page', () => {
    const state = mergeOutcomeState({ summary, fromTitle: 'No boot after a drop' });
    expect(mergeOutcomeFrom(state, 30)).toEqual({ summary, fromTitle: 'No boot after a drop' });
  });

  it('is ignored on another case’s page and when the state has another shape', () => {
    const state = mergeOutcomeState({ summary, fromTitle: 'No boot after a drop' });
    expect(mergeOutcomeFrom(state, 31)).toBeNull();
    expect(mergeOutcomeFrom(null, 30)).toBeNull();
    expect(
      mergeOutcomeFrom({ merged: { summary: { ...summary, moved: {} }, fromTitle: 'x' } }, 30),
    ).toBeNull();
  });
});
