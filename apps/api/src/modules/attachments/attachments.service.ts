// Attachments of a case: who may add, see and remove them, and keeping the stored bytes and the rows in
// step. An upload is all or nothing: every file is checked before anything is stored, and files
// already stored are removed again if a later step fails.
import { roleAtLeast, type UserRole } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import type { Logger } from '../../lib/logger';
import {
  prepareAttachment,
  thumbnailType,
  type PreparedAttachment,
  type UploadedFile,
} from './attachment-content';
import { newStorageKey, type AttachmentStorage, type StoredObject } from './attachment-storage';
import type { AttachmentRow, AttachmentsRepository, CaseAccess } from './attachments.repository';

export interface Actor {
  id: number;
  role: UserRole;
}

export interface AttachmentView {
  id: number;
  caseId: number;
  uploaderId: number;
  name: string;
  contentType: string;
  byteSize: number;
  width: number | null;
  height: number | null;
  createdAt: string;
  url: string;
  thumbnailUrl: string | null;
}

export const attachmentPaths = {
  file: (id: number) => `/api/attachments/${id}`,
  thumbnail: (id: number) => `/api/attachments/${id}/thumbnail`,
};

export function toAttachmentView(row: AttachmentRow): AttachmentView {
  return {
    id: row.id,
    caseId: row.caseId,
    uploaderId: row.uploaderId,
    name: row.originalName,
    contentType: row.contentType,
    byteSize: row.byteSize,
    width: row.width,
    height: row.height,
    createdAt: row.createdAt.toISOString(),
    url: attachmentPaths.file(row.id),
    thumbnailUrl: row.thumbnailKey ? attachmentPaths.thumbnail(row.id) : null,
  };
}

export interface OpenedAttachment {
  name: string;
  contentType: string;
  /** the storage key, stable for the life of the bytes: an ETag */
  key: string;
  object: StoredObject;
}

const isModerator = (actor: Actor | undefined) =>
  actor !== undefined && roleAtLeast(actor.role, 'moderator');

/** Drafts are seen by their author and moderators only; to anyone else they do not exist. */
function canSee(c: CaseAccess, viewer: Actor | undefined): boolean {
  return (
    c.status === 'published' ||
    (viewer !== undefined && (viewer.id === c.authorId || isModerator(viewer)))
  );
}

export function createAttachmentsService(deps: {
  repo: AttachmentsRepository;
  storage: AttachmentStorage;
  logger: Logger;
}) {
  const { repo, storage, logger } = deps;

  async function visibleCase(caseId: number, viewer: Actor | undefined): Promise<CaseAccess> {
    const found = await repo.findCase(caseId);
    if (!found || !canSee(found, viewer)) throw AppError.notFound(`Case ${caseId}`);
    return found;
  }

  async function removeStored(keys: string[]) {
    for (const key of keys) {
      await storage
        .delete(key)
        .catch((err: unknown) => logger.error({ err, key }, 'could not remove an attachment file'));
    }
  }

  async function store(prepared: PreparedAttachment[]) {
    const stored: string[] = [];
    try {
      const keyed = [];
      for (const p of prepared) {
        const storageKey = newStorageKey();
        await storage.put(storageKey, p.bytes, p.contentType);
        stored.push(storageKey);
        let thumbnailKey: string | null = null;
        if (p.thumbnail) {
          thumbnailKey = newStorageKey();
          await storage.put(thumbnailKey, p.thumbnail, thumbnailType);
          stored.push(thumbnailKey);
        }
        keyed.push({ ...p, storageKey, thumbnailKey });
      }
      return { keyed, stored };
    } catch (err) {
      await removeStored(stored);
      throw err;
    }
  }

  return {
    /** Refuses early (before the upload is read) when the person may not attach to the case. */
    async assertCanAttach(caseId: number, actor: Actor): Promise<void> {
      const found = await visibleCase(caseId, actor);
      if (found.mergedIntoId !== null) {
        throw new AppError(
          409,
          'case_merged',
          `Case ${caseId} was merged into case ${found.mergedIntoId}: attach files there`,
          { mergedIntoId: found.mergedIntoId },
        );
      }
      if (found.authorId !== actor.id && !isModerator(actor)) {
        throw new AppError(
          403,
          'forbidden',
          `Only the author of case ${caseId} or a moderator can attach files to it`,
        );
      }
    },

    async upload(caseId: number, actor: Actor, files: UploadedFile[]): Promise<AttachmentView[]> {
      if (files.length === 0) {
        throw new AppError(
          400,
          'missing_file',
          'Attach at least one file in the form field "files"',
        );
      }
      await this.assertCanAttach(caseId, actor);
      // one at a time: decoding several large images at once would multiply the memory they need
      const prepared: PreparedAttachment[] = [];
      for (const file of files) prepared.push(await prepareAttachment(file));

      const { keyed, stored } = await store(prepared);
      try {
        const rows = await repo.insertMany(
          caseId,
          keyed.map((k) => ({
            caseId,
            uploaderId: actor.id,
            storageKey: k.storageKey,
            thumbnailKey: k.thumbnailKey,
            originalName: k.originalName,
            contentType: k.contentType,
            byteSize: k.bytes.length,
            width: k.width,
            height: k.height,
          })),
        );
        return rows.map(toAttachmentView);
      } catch (err) {
        await removeStored(stored);
        // the case went away between the check and the insert
        if ((err as { cause?: { code?: string } }).cause?.code === '23503')
          throw AppError.notFound(`Case ${caseId}`);
        throw err;
      }
    },

    async list(caseId: number, viewer: Actor | undefined): Promise<AttachmentView[]> {
      await visibleCase(caseId, viewer);
      return (await repo.listForCase(caseId)).map(toAttachmentView);
    },

    async open(
      id: number,
      variant: 'file' | 'thumbnail',
      viewer: Actor | undefined,
    ): Promise<OpenedAttachment> {
      const found = await repo.findWithCase(id);
      if (!found || !canSee(found.case, viewer)) throw AppError.notFound(`Attachment ${id}`);
      const { attachment } = found;
      const key = variant === 'file' ? attachment.storageKey : attachment.thumbnailKey;
      if (!key)
        throw new AppError(
          404,
          'not_found',
          `Attachment ${id} (${attachment.contentType}) has no thumbnail`,
        );
      const object = await storage.get(key);
      if (!object) {
        logger.error({ attachment: id, key }, 'attachment row without its file');
        throw new AppError(404, 'not_found', `The file of attachment ${id} is missing`);
      }
      const name =
        variant === 'file'
          ? attachment.originalName
          : `${attachment.originalName.replace(/\.[^.]+$/, '')}.thumbnail.webp`;
      return {
        name,
        contentType: variant === 'file' ? attachment.contentType : thumbnailType,
        key,
        object,
      };
    },

    async remove(id: number, actor: Actor): Promise<void> {
      const found = await repo.findWithCase(id);
      if (!found || !canSee(found.case, actor)) throw AppError.notFound(`Attachment ${id}`);
      if (found.attachment.uploaderId !== actor.id && !isModerator(actor)) {
        throw new AppError(
          403,
          'forbidden',
          `Only the person who uploaded attachment ${id} or a moderator can remove it`,
        );
      }
      const removed = await repo.delete(id);
      if (!removed) throw AppError.notFound(`Attachment ${id}`);
      // the row goes first: a file without a row is only wasted space, a row without a file is a broken link
      await removeStored([
        removed.storageKey,
        ...(removed.thumbnailKey ? [removed.thumbnailKey] : []),
      ]);
    },

    /**
     * The storage keys of a case's attachments, for the casebook to remove the files after it deletes a
     * case (the rows go with the case by ON DELETE CASCADE, the files do not).
     */
    async storageKeysOfCase(caseId: number): Promise<string[]> {
      return (await repo.listForCase(caseId)).flatMap((r) => [
        r.storageKey,
        ...(r.thumbnailKey ? [r.thumbnailKey] : []),
      ]);
    },

    removeFiles: removeStored,
  };
}

export type AttachmentsService = ReturnType<typeof createAttachmentsService>;
