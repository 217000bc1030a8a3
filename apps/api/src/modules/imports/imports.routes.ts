import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { boardMetaSchema, boardSlugSchema, importRequestFieldsSchema } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import { requireRole } from '../../middleware/require-role';
import type { ImportsService, UploadedFile } from './imports.service';

const fileFields = ['netlist', 'parts', 'annotations'] as const;
const waitQuerySchema = z.strictObject({ wait: z.enum(['true', 'false']).optional() });

export function importsRouter(service: ImportsService, options: { maxBytes: number; uploadLimit: RequestHandler }): Router {
  const router = Router();
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: options.maxBytes, files: fileFields.length, fields: 10, fieldSize: 64 * 1024 },
  }).fields(fileFields.map((name) => ({ name, maxCount: 1 })));

  router.post('/boards/:slug/imports', requireRole('admin'), options.uploadLimit, upload, async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const { wait } = waitQuerySchema.parse(req.query);
    const fields = importRequestFieldsSchema.parse(req.body ?? {});
    const files = (req.files ?? {}) as Partial<Record<(typeof fileFields)[number], Express.Multer.File[]>>;
    const file = (name: (typeof fileFields)[number]): UploadedFile | undefined => {
      const f = files[name]?.[0];
      return f ? { name: f.originalname || name, bytes: f.buffer } : undefined;
    };
    const netlist = file('netlist');
    if (!netlist) {
      throw new AppError(400, 'missing_file', 'Attach the netlist file in the form field "netlist"');
    }
    let meta;
    if (fields.board !== undefined) {
      let parsed: unknown;
      try {
        parsed = JSON.parse(fields.board);
      } catch {
        throw new AppError(400, 'invalid_request', 'The field "board" is not valid JSON');
      }
      const result = boardMetaSchema.partial().safeParse(parsed);
      if (!result.success) {
        throw new AppError(400, 'invalid_request', 'The board details are not valid', {
          issues: result.error.issues.map((i) => ({ field: ['board', ...i.path.map(String)].join('.'), message: i.message })),
        });
      }
      meta = result.data;
    }

    const { job, done } = await service.startImport({
      slug,
      format: fields.format,
      replace: fields.replace,
      meta,
      netlist,
      parts: file('parts'),
      annotations: file('annotations'),
      enteredBy: `user:${req.user!.id}`,
    });
    if (wait !== 'true') {
      res.status(202).location(`/api/imports/${job.id}`).json({ job });
      return;
    }
    const finished = await done;
    if (finished.status === 'failed') {
      throw new AppError(409, 'import_failed', finished.errors[0]?.message ?? 'The import failed', { job: finished });
    }
    res.status(201).json({ job: finished });
  });

  router.get('/imports/:id', async (req, res) => {
    const id = z.uuid().safeParse(req.params.id);
    if (!id.success) throw AppError.notFound(`Import ${req.params.id}`);
    res.json({ job: await service.getJob(id.data) });
  });

  return router;
}
