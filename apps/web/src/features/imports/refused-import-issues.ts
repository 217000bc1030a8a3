import { z } from 'zod';
import { importIssueSchema, type ImportIssue } from '@railyard/shared';

const detailsSchema = z.object({
  errors: z.array(importIssueSchema).default([]),
  warnings: z.array(importIssueSchema).default([]),
});

/** The file problems a refused import carries in its error details; empty lists for any other error. */
export function refusedImportIssues(details: unknown): { errors: ImportIssue[]; warnings: ImportIssue[] } {
  const parsed = detailsSchema.safeParse(details);
  return parsed.success ? parsed.data : { errors: [], warnings: [] };
}
