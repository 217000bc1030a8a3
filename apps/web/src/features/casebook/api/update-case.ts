import type { CaseDetail, CaseUpdate } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { refreshWrittenCase } from './case-written';

/** Changes what `change` names; a list given replaces the case's list. Only the author may. */
export async function updateCase(id: number, change: CaseUpdate): Promise<CaseDetail> {
  const answer = await api.patch<{ case: CaseDetail }>(`/cases/${id}`, change);
  return answer.case;
}

export function useUpdateCase(slug: string, id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: CaseUpdate) => updateCase(id, change),
    onSuccess: (updated) => refreshWrittenCase(queryClient, slug, updated),
  });
}
