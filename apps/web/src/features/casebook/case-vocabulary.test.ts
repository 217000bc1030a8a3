import { caseLimits, caseOutcomes, caseSorts } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import {
  casesPerPage,
  commentMaxLength,
  confirmationNoteMaxLength,
  outcomeLabel,
  outcomesInOrder,
  queryMaxLength,
  sortsInOrder,
} from './case-vocabulary';

describe('casebook words and limits of the interface', () => {
  it('lists every outcome of the API contract, once', () => {
    // packages/shared/src/casebook.ts: caseOutcomes
    expect([...outcomesInOrder].sort()).toEqual([...caseOutcomes].sort());
    expect(Object.keys(outcomeLabel).sort()).toEqual([...caseOutcomes].sort());
  });

  it('lists every sort order of the API contract, once', () => {
    expect([...sortsInOrder].sort()).toEqual([...caseSorts].sort());
  });

  it('uses the contract’s limits', () => {
    expect(commentMaxLength).toBe(caseLimits.comment);
    expect(confirmationNoteMaxLength).toBe(caseLimits.confirmationNote);
    expect(queryMaxLength).toBe(caseLimits.query);
    expect(casesPerPage).toBeLessThanOrEqual(caseLimits.pageSize);
  });
});
