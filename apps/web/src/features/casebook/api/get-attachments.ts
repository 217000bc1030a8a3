// Photos, thermal images and scope captures on a case. The shape is the attachments module's answer
// (apps/api/src/modules/attachments/README.md); it is not in the shared contract yet.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import { caseQueryKey } from './case-keys';

export type CaseAttachment = {
  id: number;
  caseId: number;
  uploaderId: number;
  name: string;
  contentType: string;
  byteSize: number;
  width: number | null;
  height: number | null;
  createdAt: string;
  /** where the file is served, under /api */
  url: string;
  /** a WebP thumbnail; null for a PDF */
  thumbnailUrl: string | null;
};

export function attachmentsQueryKey(caseId: number) {
  return [...caseQueryKey(caseId), 'attachments'] as const;
}

export async function getAttachments(caseId: number, signal?: AbortSignal) {
  const answer = await api.get<{ attachments: CaseAttachment[] }>(`/cases/${caseId}/attachments`, {
    signal,
  });
  return answer.attachments;
}

export function attachmentsQueryOptions(caseId: number) {
  return queryOptions({
    queryKey: attachmentsQueryKey(caseId),
    queryFn: ({ signal }) => getAttachments(caseId, signal),
  });
}

export function useAttachments(caseId: number) {
  return useQuery(attachmentsQueryOptions(caseId));
}

/**
 * Whether the answer says this API has no attachments at all (a server without the attachments
 * routes answers 404 for the list of a case it has just shown): the page then offers none.
 */
export function attachmentsUnavailable(error: unknown): boolean {
  return isApiError(error) && error.status === 404;
}
