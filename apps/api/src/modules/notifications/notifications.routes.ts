import { Router, type RequestHandler } from 'express';
import { requireJsonBody } from '../../middleware/csrf-guard';
import { requireRole } from '../../middleware/require-role';
import { notificationPreferencesInputSchema } from './notification-kinds';
import type { NotificationsService } from './notifications.service';

export function notificationsRouter(
  service: NotificationsService,
  writeLimit: RequestHandler,
): Router {
  const router = Router();
  const member = requireRole('member');

  router.get('/me/notifications', member, async (req, res) => {
    res.json(await service.settings(req.user!.id));
  });

  router.put('/me/notifications', member, writeLimit, requireJsonBody, async (req, res) => {
    const { mode } = notificationPreferencesInputSchema.parse(req.body);
    res.json(await service.setMode(req.user!.id, mode));
  });

  return router;
}
