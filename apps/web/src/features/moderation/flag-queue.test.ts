import { flagStatuses as contractStatuses } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import {
  flaggedContentHref,
  flaggedContentLabel,
  flagQueueHref,
  flagStatuses,
  flagStatusOf,
} from './flag-queue';

describe('the moderation queue’s tabs', () => {
  it('knows the same statuses as the contract', () => {
    expect([...flagStatuses]).toEqual([...contractStatuses]);
  });

  it('opens the open reports unless the address asks for the resolved ones', () => {
    expect(flagStatusOf(new URLSearchParams(''))).toBe('open');
    expect(flagStatusOf(new URLSearchParams('status=resolved'))).toBe('resolved');
    expect(flagStatusOf(new URLSearchParams('status=everything'))).toBe('open');
  });

  it('links the open tab without a query and the resolved tab with one', () => {
    expect(flagQueueHref('open')).toBe('/moderation');
    expect(flagQueueHref('resolved')).toBe('/moderation?status=resolved');
  });
});

describe('what a report points at', () => {
  it('names and links a reported case', () => {
    const flag = { contentType: 'case' as const, contentId: 12, caseId: 12 };
    expect(flaggedContentLabel(flag)).toBe('Case #12');
    expect(flaggedContentHref(flag)).toBe('/cases/12');
  });

  it('links a reported comment to its place on the case', () => {
    const flag = { contentType: 'comment' as const, contentId: 40, caseId: 12 };
    expect(flaggedContentLabel(flag)).toBe('Comment #40 on case #12');
    expect(flaggedContentHref(flag)).toBe('/cases/12#comment-40');
  });

  it('has no link when the case is gone', () => {
    const flag = { contentType: 'comment' as const, contentId: 40, caseId: null };
    expect(flaggedContentLabel(flag)).toBe('Comment #40');
    expect(flaggedContentHref(flag)).toBeNull();
  });
});
