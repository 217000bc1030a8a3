import { eq } from 'drizzle-orm';
import type { ImportIssue, ImportJob, ImportSummary, NetlistFormat } from '@railyard/shared';
import type { Database } from '../../db/client';
import { importJobs } from '../../db/schema';

type JobRow = typeof importJobs.$inferSelect;

function toJob(row: JobRow): ImportJob {
  return {
    id: row.id,
    board: row.boardSlug,
    format: row.format,
    fileName: row.fileName,
    status: row.status,
    phase: row.phase,
    progress: row.progress,
    errors: row.errors,
    warnings: row.warnings,
    summary: row.summary ?? null,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}

export function createImportsRepository(db: Database) {
  return {
    async createJob(job: { boardSlug: string; format: NetlistFormat; fileName: string; warnings: ImportIssue[] }) {
      const [row] = await db
        .insert(importJobs)
        .values({ ...job, status: 'running', phase: 'starting', progress: 0.1 })
        .returning();
      return toJob(row!);
    },

    async updateProgress(id: string, phase: string, progress: number) {
      await db.update(importJobs).set({ phase, progress }).where(eq(importJobs.id, id));
    },

    async finishJob(
      id: string,
      result:
        | { status: 'succeeded'; boardId: number; summary: ImportSummary; warnings: ImportIssue[] }
        | { status: 'failed'; errors: ImportIssue[] },
    ) {
      const common = { status: result.status, finishedAt: new Date() };
      const [row] = await db
        .update(importJobs)
        .set(
          result.status === 'succeeded'
            ? { ...common, phase: 'done', progress: 1, boardId: result.boardId, summary: result.summary, warnings: result.warnings }
            : { ...common, phase: 'failed', errors: result.errors },
        )
        .where(eq(importJobs.id, id))
        .returning();
      return toJob(row!);
    },

    async findJob(id: string) {
      const rows = await db.select().from(importJobs).where(eq(importJobs.id, id));
      return rows[0] ? toJob(rows[0]) : null;
    },
  };
}

export type ImportsRepository = ReturnType<typeof createImportsRepository>;
