import type { NotificationMode, NotificationSettings } from '@railyard/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { notificationSettingsQueryKey } from './get-notification-settings';

export function updateNotificationSettings(mode: NotificationMode): Promise<NotificationSettings> {
  return api.put<NotificationSettings>('/me/notifications', { mode });
}

export function useUpdateNotificationSettings(userId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateNotificationSettings,
    // The answer is the stored settings, address included: nothing to ask again.
    onSuccess: (settings) =>
      queryClient.setQueryData(notificationSettingsQueryKey(userId), settings),
  });
}
