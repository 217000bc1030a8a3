// Files attached to casebook write-ups: photos, thermal images, scope captures. The bytes live in the
// attachment storage under generated keys; a row holds what the upload said and what the bytes are.
import { index, integer, pgTable, text } from 'drizzle-orm/pg-core';
import { cases } from './casebook';
import { createdAt, id } from './columns';
import { users } from './users';

export const caseAttachments = pgTable(
  'case_attachments',
  {
    id: id(),
    caseId: integer()
      .notNull()
      .references(() => cases.id, { onDelete: 'cascade' }),
    uploaderId: integer()
      .notNull()
      .references(() => users.id),
    /** generated key in the attachment storage, never derived from the uploaded name */
    storageKey: text().notNull().unique(),
    /** WebP preview for images; null for PDF */
    thumbnailKey: text().unique(),
    /** the name the uploader's file had, cleaned for display and downloads */
    originalName: text().notNull(),
    /** sniffed from the bytes, never taken from the client */
    contentType: text().notNull(),
    byteSize: integer().notNull(),
    /** pixels after EXIF orientation is applied; null for PDF */
    width: integer(),
    height: integer(),
    createdAt: createdAt(),
  },
  (t) => [index('case_attachments_case_idx').on(t.caseId, t.createdAt)],
);
