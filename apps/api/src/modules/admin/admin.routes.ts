import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import { auditQuerySchema, auditUndoInputSchema, idParamSchema, userUpdateSchema } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import { requireJsonBody } from '../../middleware/csrf-guard';
import { requireRole } from '../../middleware/require-role';
import type { AuditRepository } from '../audit/audit.repository';
import { toAdminUser, type UsersRepository } from '../auth/users.repository';
import type { CasebookService } from '../casebook/casebook.service';

const userId = z.coerce.number().int().positive();

export function adminRouter(deps: {
  users: UsersRepository;
  audit: AuditRepository;
  casebook: CasebookService;
  writeLimit: RequestHandler;
}): Router {
  const { users, audit, casebook, writeLimit } = deps;
  const router = Router();
  const admin = requireRole('admin');

  router.get('/admin/users', admin, async (_req, res) => {
    res.json({ users: (await users.list()).map(toAdminUser) });
  });

  router.patch('/admin/users/:id', admin, writeLimit, requireJsonBody, async (req, res) => {
    const change = userUpdateSchema.parse(req.body);
    const target = await users.findById(userId.parse(req.params.id));
    if (!target) throw AppError.notFound(`User ${req.params.id}`);
    if (target.id === req.user!.id && (change.banned === true || (change.role !== undefined && change.role !== 'admin'))) {
      // the last word on one's own account stays with another admin
      throw AppError.badRequest('You cannot ban or demote yourself', { field: change.banned ? 'banned' : 'role' });
    }
    const updated = await users.update(target, change, req.user!.id);
    res.json({ user: toAdminUser(updated) });
  });

  router.get('/admin/audit', admin, async (req, res) => {
    const query = auditQuerySchema.parse(req.query);
    res.json({ entries: await audit.list(query.limit, query.before) });
  });

  // only case merges can be taken back; the casebook knows how
  router.post('/admin/audit/:id/undo', admin, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParamSchema.parse(req.params.id);
    const { reason } = auditUndoInputSchema.parse(req.body);
    const undone = await casebook.undoMerge(id, reason, req.user!);
    res.json({ entry: await audit.find(undone.entryId), fromCase: undone.fromCase, intoCase: undone.intoCase });
  });

  return router;
}
