// Each person's choice of how to get notification e-mails.
import { AppError } from '../../lib/app-error';
import type { NotificationSettings } from '@railyard/shared';
import { defaultNotificationMode, type NotificationMode } from './notification-kinds';
import type { NotificationsRepository } from './notifications.repository';

export function createNotificationsService(deps: {
  repo: NotificationsRepository;
  clock?: () => Date;
}) {
  const { repo } = deps;
  const clock = deps.clock ?? (() => new Date());

  async function settings(userId: number): Promise<NotificationSettings> {
    const user = await repo.findUserEmail(userId);
    if (!user) throw AppError.notFound(`User ${userId}`);
    return { mode: (await repo.getMode(userId)) ?? defaultNotificationMode, email: user.email };
  }

  return {
    settings,

    async setMode(userId: number, mode: NotificationMode): Promise<NotificationSettings> {
      await repo.setMode(userId, mode, clock());
      return settings(userId);
    },
  };
}

export type NotificationsService = ReturnType<typeof createNotificationsService>;
