import type { NetlistFormat } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, type UploadProgress } from '../../../lib/api-client';
import { importQueryOptions, type ImportJobResponse } from './get-import';

export type CreateImportInput = {
  slug: string;
  netlist: File;
  parts?: File | null;
  annotations?: File | null;
  /** Omitted to let the server detect the format from the file. */
  format?: NetlistFormat | null;
  replace?: boolean;
  /** Metadata of a board that does not exist yet, sent as JSON text. */
  board?: Record<string, unknown> | null;
};

export function createImport(
  input: CreateImportInput,
  options: { onUploadProgress?: (progress: UploadProgress) => void; signal?: AbortSignal } = {},
): Promise<ImportJobResponse> {
  const form = new FormData();
  // Text fields go first so the server can reject a bad request before the files arrive.
  if (input.format) form.append('format', input.format);
  if (input.replace) form.append('replace', 'true');
  if (input.board) form.append('board', JSON.stringify(input.board));
  form.append('netlist', input.netlist);
  if (input.parts) form.append('parts', input.parts);
  if (input.annotations) form.append('annotations', input.annotations);
  return api.upload<ImportJobResponse>(
    `/boards/${encodeURIComponent(input.slug)}/imports`,
    form,
    options,
  );
}

export function useCreateImport(options: {
  onUploadProgress?: (progress: UploadProgress) => void;
}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateImportInput) =>
      createImport(input, { onUploadProgress: options.onUploadProgress }),
    onSuccess: (response) => {
      // The accepted job is shown at once; polling takes it from there.
      queryClient.setQueryData(importQueryOptions(response.job.id).queryKey, response);
    },
  });
}
