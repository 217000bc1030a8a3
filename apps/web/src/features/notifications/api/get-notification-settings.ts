// How the signed-in person gets notification e-mails (GET /api/me/notifications).
import type { NotificationSettings } from '@railyard/shared';
import { queryOptions, useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function getNotificationSettings(signal?: AbortSignal): Promise<NotificationSettings> {
  return api.get<NotificationSettings>('/me/notifications', { signal });
}

// Not under ['me']: a refusal reloads ['me'] with everything under it, and a signed-out reload of
// this would be refused again. Keyed by the person, so nobody sees another's cached address.
export const notificationSettingsQueryKey = (userId: number) =>
  ['notification-settings', userId] as const;

export function notificationSettingsQueryOptions(userId: number) {
  return queryOptions({
    queryKey: notificationSettingsQueryKey(userId),
    queryFn: ({ signal }) => getNotificationSettings(signal),
  });
}

export function useNotificationSettings(userId: number) {
  return useSuspenseQuery(notificationSettingsQueryOptions(userId));
}

/** The signed-in person's address, for pages that only use it as a default; null for a visitor. */
export function useOwnEmail(userId: number | null | undefined): string | null | undefined {
  const { data, isError } = useQuery({
    ...notificationSettingsQueryOptions(userId ?? 0),
    enabled: userId != null,
  });
  if (userId === null) return null;
  if (data) return data.email;
  return isError ? null : undefined;
}
