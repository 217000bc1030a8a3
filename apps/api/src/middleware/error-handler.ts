import type { ErrorRequestHandler, RequestHandler } from 'express';
import multer from 'multer';
import { ZodError } from 'zod';
import { AppError } from '../lib/app-error';
import type { Logger } from '../lib/logger';

const multerStatus: Record<string, { status: number; code: string }> = {
  LIMIT_FILE_SIZE: { status: 413, code: 'file_too_large' },
  LIMIT_FILE_COUNT: { status: 413, code: 'too_many_files' },
  LIMIT_FIELD_VALUE: { status: 413, code: 'field_too_large' },
  LIMIT_PART_COUNT: { status: 413, code: 'too_many_parts' },
  LIMIT_UNEXPECTED_FILE: { status: 400, code: 'unexpected_file' },
};

/** Zod issues flattened into the `details.issues` list every client reads. */
export function zodIssues(error: ZodError) {
  return error.issues.map((issue) => ({
    field: issue.path.map(String).join('.') || null,
    message: issue.message,
  }));
}

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `No API route for ${req.method} ${req.path}`));
};

export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (err instanceof AppError) {
      res.status(err.status).json({ error: { code: err.code, message: err.message, details: err.details } });
      return;
    }
    if (err instanceof ZodError) {
      res.status(400).json({
        error: { code: 'invalid_request', message: 'The request is not valid', details: { issues: zodIssues(err) } },
      });
      return;
    }
    if (err instanceof multer.MulterError) {
      const mapped = multerStatus[err.code] ?? { status: 400, code: 'bad_upload' };
      const where = err.field ? ` (field "${err.field}")` : '';
      res.status(mapped.status).json({ error: { code: mapped.code, message: `${err.message}${where}` } });
      return;
    }
    // body-parser marks its own client errors (bad JSON, too large) with a status
    const status = typeof err?.status === 'number' && err.status >= 400 && err.status < 500 ? err.status : 500;
    if (status < 500) {
      res.status(status).json({ error: { code: err.type ?? 'bad_request', message: String(err.message) } });
      return;
    }
    logger.error({ err, method: req.method, url: req.originalUrl }, 'unhandled error');
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server' } });
  };
}
