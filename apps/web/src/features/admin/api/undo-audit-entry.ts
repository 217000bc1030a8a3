import type { AuditEntry, CaseDetail } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { auditLogQueryKey } from './get-audit-log';

export type AuditUndoResult = { entry: AuditEntry; fromCase: CaseDetail; intoCase: CaseDetail };

/** Takes back what an audit entry records (a case merge); the undo writes its own entry. */
export function undoAuditEntry(id: number, reason: string): Promise<AuditUndoResult> {
  return api.post<AuditUndoResult>(`/admin/audit/${id}/undo`, { reason });
}

/**
 * Must stay the casebook's root query key (features/casebook/api/case-keys.ts): an undone merge
 * changes both cases, their comments and attachments, and the board's lists.
 */
const casebookQueryKey = ['cases'] as const;

export function useUndoAuditEntry() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, reason }: { id: number; reason: string }) => undoAuditEntry(id, reason),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: auditLogQueryKey }),
        queryClient.invalidateQueries({ queryKey: casebookQueryKey }),
      ]),
  });
}
