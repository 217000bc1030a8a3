import { doublePrecision, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { ImportIssue, ImportSummary } from '@railyard/shared';
import { boards } from './boards';
import { createdAt } from './columns';
import { importJobStatusEnum, netlistFormatEnum } from './enums';

/** One row per import; progress is written outside the import's transaction so clients can poll it. */
export const importJobs = pgTable('import_jobs', {
  id: uuid().primaryKey().defaultRandom(),
  boardSlug: text().notNull(),
  boardId: integer().references(() => boards.id, { onDelete: 'set null' }),
  format: netlistFormatEnum().notNull(),
  fileName: text().notNull(),
  status: importJobStatusEnum().notNull().default('queued'),
  phase: text().notNull().default('queued'),
  progress: doublePrecision().notNull().default(0),
  errors: jsonb().$type<ImportIssue[]>().notNull().default([]),
  warnings: jsonb().$type<ImportIssue[]>().notNull().default([]),
  summary: jsonb().$type<ImportSummary>(),
  createdAt: createdAt(),
  finishedAt: timestamp({ withTimezone: true, mode: 'date' }),
});
