// Attachment uploads (multipart, field "files"), listings, downloads and removal. Files are served with
// the type sniffed at upload, nosniff, and a CSP that forbids everything and sandboxes the response,
// so even a hostile PDF opened in a tab runs no script with Railyard's origin.
import { pipeline } from 'node:stream/promises';
import { Router, type RequestHandler, type Response } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { AppError } from '../../lib/app-error';
import { requireRole } from '../../middleware/require-role';
import { contentDisposition } from './attachment-filename';
import type { Actor, AttachmentsService, OpenedAttachment } from './attachments.service';

export interface AttachmentsRouterOptions {
  /** largest file, in bytes (ATTACHMENT_MAX_BYTES) */
  maxBytes: number;
  /** most files per upload (ATTACHMENT_MAX_FILES) */
  maxFiles: number;
  uploadLimit: RequestHandler;
  writeLimit: RequestHandler;
  /** Cache-Control max-age of served files, in seconds */
  maxAgeSeconds?: number;
}

// ids are PostgreSQL integers; anything else names no attachment
const idSchema = z.coerce.number().int().positive().max(2_147_483_647);

function idParam(value: unknown, what: string): number {
  const parsed = idSchema.safeParse(value);
  if (!parsed.success) throw AppError.notFound(`${what} ${String(value)}`);
  return parsed.data;
}

function actorOf(user: Express.User | undefined): Actor | undefined {
  return user ? { id: user.id, role: user.role } : undefined;
}

function mebibytes(bytes: number): string {
  const mib = bytes / (1024 * 1024);
  return Number.isInteger(mib) ? `${mib} MiB` : `${mib.toFixed(1)} MiB`;
}

/** multer with limits from config; its limit errors become messages that name the file and the limit. */
function uploadParser(maxBytes: number, maxFiles: number): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    // browsers send UTF-8 file names without saying so; busboy's default (latin1) would garble them
    defParamCharset: 'utf8',
    // limits.files, not array()'s maxCount: that one reports an extra file as LIMIT_UNEXPECTED_FILE (400)
    limits: {
      fileSize: maxBytes,
      files: maxFiles,
      fields: 10,
      fieldSize: 4096,
      parts: maxFiles + 10,
    },
  }).array('files');
  return (req, res, next) => {
    parse(req, res, (err?: unknown) => {
      if (!(err instanceof multer.MulterError)) return next(err);
      const file = (err as multer.MulterError & { filename?: string }).filename;
      switch (err.code) {
        case 'LIMIT_FILE_SIZE':
          return next(
            new AppError(
              413,
              'file_too_large',
              `${file ? JSON.stringify(file) : 'A file'} is larger than ${mebibytes(maxBytes)}, the most a file may have`,
              {
                file: file ?? null,
                maxBytes,
              },
            ),
          );
        case 'LIMIT_FILE_COUNT':
          return next(
            new AppError(
              413,
              'too_many_files',
              `At most ${maxFiles} files can be attached at once`,
              { maxFiles },
            ),
          );
        case 'LIMIT_UNEXPECTED_FILE':
          return next(
            new AppError(
              400,
              'unexpected_file',
              `Send the files in the form field "files", not "${err.field ?? ''}"`,
              { field: err.field ?? null },
            ),
          );
        default:
          return next(err);
      }
    });
  };
}

async function sendStored(
  req: Parameters<RequestHandler>[0],
  res: Response,
  opened: OpenedAttachment,
  maxAgeSeconds: number,
) {
  const disposition = opened.contentType.startsWith('image/') ? 'inline' : 'attachment';
  res.set({
    'Content-Type': opened.contentType,
    'Content-Length': String(opened.object.byteSize),
    'Content-Disposition': contentDisposition(disposition, opened.name),
    'X-Content-Type-Options': 'nosniff',
    'Cache-Control': `private, max-age=${maxAgeSeconds}`,
    'Content-Security-Policy': "default-src 'none'; sandbox",
    ETag: `"${opened.key.slice(0, 32)}"`,
  });
  if (req.fresh) {
    opened.object.stream.destroy();
    res.status(304).end();
    return;
  }
  try {
    await pipeline(opened.object.stream, res);
  } catch (err) {
    // the client went away, or the disk failed mid-file: the status line is long gone, so just cut it
    if (!res.headersSent) throw err;
    res.destroy();
  }
}

export function attachmentsRouter(
  service: AttachmentsService,
  options: AttachmentsRouterOptions,
): Router {
  const router = Router();
  const member = requireRole('member');
  const maxAge = options.maxAgeSeconds ?? 3600;

  // the ownership check runs before the body is read: nobody uploads 80 MB only to hear "forbidden"
  const mayAttach: RequestHandler = async (req, _res, next) => {
    await service.assertCanAttach(idParam(req.params.id, 'Case'), actorOf(req.user)!);
    next();
  };

  router.post(
    '/cases/:id/attachments',
    member,
    options.uploadLimit,
    mayAttach,
    uploadParser(options.maxBytes, options.maxFiles),
    async (req, res) => {
      const caseId = idParam(req.params.id, 'Case');
      const files = ((req.files ?? []) as Express.Multer.File[]).map((f) => ({
        name: f.originalname || 'attachment',
        bytes: f.buffer,
      }));
      const attachments = await service.upload(caseId, actorOf(req.user)!, files);
      res.status(201).json({ attachments });
    },
  );

  router.get('/cases/:id/attachments', async (req, res) => {
    res.json({
      attachments: await service.list(idParam(req.params.id, 'Case'), actorOf(req.user)),
    });
  });

  router.get('/attachments/:id', async (req, res) => {
    await sendStored(
      req,
      res,
      await service.open(idParam(req.params.id, 'Attachment'), 'file', actorOf(req.user)),
      maxAge,
    );
  });

  router.get('/attachments/:id/thumbnail', async (req, res) => {
    await sendStored(
      req,
      res,
      await service.open(idParam(req.params.id, 'Attachment'), 'thumbnail', actorOf(req.user)),
      maxAge,
    );
  });

  router.delete('/attachments/:id', member, options.writeLimit, async (req, res) => {
    await service.remove(idParam(req.params.id, 'Attachment'), actorOf(req.user)!);
    res.status(204).end();
  });

  return router;
}
