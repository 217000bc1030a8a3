import type { CaseCreate, CaseDetail } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshWrittenCase } from './case-written';

export async function createCase(slug: string, input: CaseCreate): Promise<CaseDetail> {
  const answer = await api.post<{ case: CaseDetail }>(
    `/boards/${encodeURIComponent(slug)}/cases`,
    input,
  );
  return answer.case;
}

export function useCreateCase(slug: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CaseCreate) => createCase(slug, input),
    onSuccess: (created) => refreshWrittenCase(queryClient, slug, created),
  });
}
