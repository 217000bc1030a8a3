// Rows of case_attachments, and the little of a case the attachment rules need (its author, status and
// whether it was merged away).
import { asc, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { caseAttachments } from '../../db/schema/attachments';
import { cases } from '../../db/schema/casebook';
import { lockUnmergedCase } from '../casebook/casebook.repository';

export type AttachmentRow = typeof caseAttachments.$inferSelect;
export type NewAttachmentRow = typeof caseAttachments.$inferInsert;

export interface CaseAccess {
  id: number;
  authorId: number;
  status: (typeof cases.$inferSelect)['status'];
  /** set once a moderator merged the case into another, which then takes its new attachments */
  mergedIntoId: number | null;
}

const caseAccess = {
  id: cases.id,
  authorId: cases.authorId,
  status: cases.status,
  mergedIntoId: cases.mergedIntoId,
};

export function createAttachmentsRepository(db: Database) {
  return {
    async findCase(caseId: number): Promise<CaseAccess | null> {
      const rows = await db.select(caseAccess).from(cases).where(eq(cases.id, caseId));
      return rows[0] ?? null;
    },

    /**
     * All rows of one upload in one transaction: either every file of it is listed or none. The case row
     * is share-locked first, so an upload meeting a merge of its case waits for it and is then refused.
     */
    async insertMany(caseId: number, rows: NewAttachmentRow[]): Promise<AttachmentRow[]> {
      return db.transaction(async (tx) => {
        await lockUnmergedCase(tx, caseId, 'key share', 'attach files there');
        return tx.insert(caseAttachments).values(rows).returning();
      });
    },

    async listForCase(caseId: number): Promise<AttachmentRow[]> {
      return db
        .select()
        .from(caseAttachments)
        .where(eq(caseAttachments.caseId, caseId))
        .orderBy(asc(caseAttachments.createdAt), asc(caseAttachments.id));
    },

    async findWithCase(
      id: number,
    ): Promise<{ attachment: AttachmentRow; case: CaseAccess } | null> {
      const rows = await db
        .select({
          attachment: caseAttachments,
          case: caseAccess,
        })
        .from(caseAttachments)
        .innerJoin(cases, eq(cases.id, caseAttachments.caseId))
        .where(eq(caseAttachments.id, id));
      return rows[0] ?? null;
    },

    async delete(id: number): Promise<AttachmentRow | null> {
      const rows = await db.delete(caseAttachments).where(eq(caseAttachments.id, id)).returning();
      return rows[0] ?? null;
    },
  };
}

export type AttachmentsRepository = ReturnType<typeof createAttachmentsRepository>;
