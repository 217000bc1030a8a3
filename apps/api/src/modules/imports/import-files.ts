// Import from files on disk: the CLI and the demo loader go through the same service as uploads.
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import type { ImportJob } from '@railyard/shared';
import type { ImportInput, ImportsService, UploadedFile } from './imports.service';

export async function readUpload(file: string): Promise<UploadedFile> {
  return { name: path.basename(file), bytes: await readFile(file) };
}

export async function importFromDisk(
  service: ImportsService,
  options: Omit<ImportInput, 'netlist' | 'parts' | 'annotations'> & {
    netlist: string;
    parts?: string;
    annotations?: string;
  },
): Promise<ImportJob> {
  const { job, done } = await service.startImport({
    ...options,
    netlist: await readUpload(options.netlist),
    parts: options.parts ? await readUpload(options.parts) : undefined,
    annotations: options.annotations ? await readUpload(options.annotations) : undefined,
  });
  void job;
  return done;
}
