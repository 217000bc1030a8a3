// The moderation queue's address and words: which tab the address asks for, and what a flag points
// at. Anything unreadable in the address opens the open reports rather than an error.
import type { CaseFlag } from '@railyard/shared';
import { paths } from '../../config/paths';

export const flagStatuses = ['open', 'resolved'] as const;
export type FlagStatus = (typeof flagStatuses)[number];

export function flagStatusOf(search: URLSearchParams): FlagStatus {
  return search.get('status') === 'resolved' ? 'resolved' : 'open';
}

/** The queue's address for a tab; the open reports are the default, so their link stays short. */
export function flagQueueHref(status: FlagStatus): string {
  return status === 'open'
    ? paths.moderation.getHref()
    : `${paths.moderation.getHref()}?${new URLSearchParams({ status }).toString()}`;
}

type FlagTarget = Pick<CaseFlag, 'contentType' | 'contentId' | 'caseId'>;

/** "Case #12", "Comment #40 on case #12". */
export function flaggedContentLabel(flag: FlagTarget): string {
  if (flag.contentType === 'case') return `Case #${flag.contentId}`;
  return flag.caseId === null
    ? `Comment #${flag.contentId}`
    : `Comment #${flag.contentId} on case #${flag.caseId}`;
}

/**
 * Where the flagged thing is read: the case, or the comment's place on its case (the case page
 * anchors each comment as #comment-<id>). Null when the case is gone.
 */
export function flaggedContentHref(flag: FlagTarget): string | null {
  if (flag.caseId === null) return null;
  const page = paths.case.getHref(flag.caseId);
  return flag.contentType === 'case' ? page : `${page}#comment-${flag.contentId}`;
}
