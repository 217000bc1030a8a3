// Netlist import: formats, the problems a reader reports, and the import job the client polls.
import { z } from 'zod';
import { boardMetaSchema, boardSlugSchema } from './board';

export const netlistFormats = ['ipc-d-356', 'csv', 'json'] as const;
export const netlistFormatSchema = z.enum(netlistFormats);
export type NetlistFormat = z.infer<typeof netlistFormatSchema>;

/** One problem found in an input file. `line` is 1-based; `field` names the column or key. */
export const importIssueSchema = z.object({
  file: z.string().optional(),
  line: z.number().int().nullable(),
  field: z.string().nullable(),
  message: z.string(),
});
export type ImportIssue = z.infer<typeof importIssueSchema>;

export const importJobStatuses = ['queued', 'running', 'succeeded', 'failed'] as const;
export const importJobStatusSchema = z.enum(importJobStatuses);
export type ImportJobStatus = z.infer<typeof importJobStatusSchema>;

export const importSummarySchema = z.object({
  nets: z.number().int(),
  components: z.number().int(),
  pins: z.number().int(),
  powerLinks: z.number().int(),
  groundNets: z.array(z.string()),
  rootNet: z.string().nullable(),
  replaced: z.boolean(),
  /** What a --replace import could not keep because its nets are gone. */
  dropped: z.array(z.string()),
});
export type ImportSummary = z.infer<typeof importSummarySchema>;

export const importJobSchema = z.object({
  id: z.string(),
  board: z.string(),
  format: netlistFormatSchema,
  fileName: z.string(),
  status: importJobStatusSchema,
  /** Short label of the step in progress, e.g. "parsing", "writing pins". */
  phase: z.string(),
  /** 0 to 1, from the server's real progress. */
  progress: z.number().min(0).max(1),
  errors: z.array(importIssueSchema),
  warnings: z.array(importIssueSchema),
  summary: importSummarySchema.nullable(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
});
export type ImportJob = z.infer<typeof importJobSchema>;

/** Text fields sent beside the uploaded file(s) of POST /api/boards/:slug/imports. */
export const importRequestFieldsSchema = z.strictObject({
  format: netlistFormatSchema.optional(),
  replace: z
    .enum(['true', 'false'])
    .optional()
    .transform((v) => v === 'true'),
  /** Board metadata as JSON text, used when the board does not exist yet. */
  board: z.string().max(20_000).optional(),
});
export type ImportRequestFields = z.infer<typeof importRequestFieldsSchema>;

export { boardMetaSchema, boardSlugSchema };
