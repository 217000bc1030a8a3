import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, type UploadProgress } from '../../../lib/api-client';
import { attachmentsQueryKey, type CaseAttachment } from './get-attachments';

/** Uploads files to a case in one request (multipart field "files"); all are kept or none. */
export async function uploadAttachments(
  caseId: number,
  files: readonly File[],
  onUploadProgress?: (progress: UploadProgress) => void,
): Promise<CaseAttachment[]> {
  const form = new FormData();
  for (const file of files) form.append('files', file, file.name);
  const answer = await api.upload<{ attachments: CaseAttachment[] }>(
    `/cases/${caseId}/attachments`,
    form,
    { onUploadProgress },
  );
  return answer.attachments;
}

export function useUploadAttachments(
  caseId: number,
  onUploadProgress?: (progress: UploadProgress) => void,
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (files: readonly File[]) => uploadAttachments(caseId, files, onUploadProgress),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: attachmentsQueryKey(caseId) }),
  });
}
