import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import { auditQuerySchema, userUpdateSchema } from '@railyard/shared';
import { AppError } from '../../lib/app-error';
import { requireJsonBody } from '../../middleware/csrf-guard';
import { requireRole } from '../../middleware/require-role';
import type { AuditRepository } from '../audit/audit.repository';
import { toAdminUser, type UsersRepository } from '../auth/users.repository';

const userId = z.coerce.number().int().positive();

export function adminRouter(deps: { users: UsersRepository; audit: AuditRepository; writeLimit: RequestHandler }): Router {
  const { users, audit, writeLimit } = deps;
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

  return router;
}
