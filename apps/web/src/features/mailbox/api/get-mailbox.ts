// The development server's caught mail (GET /api/dev/mailbox). The API mounts it only outside
// production when no SMTP_URL is set; anywhere else it answers 404, which is an answer here, not an
// error: this server sends real mail and keeps none.
import type { CaughtMail } from '@railyard/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';

export type Mailbox = { available: true; messages: CaughtMail[] } | { available: false };

export type MailboxQuery = {
  /** only mail to this address (envelope or header, any case); all mail when empty */
  to?: string;
  limit?: number;
};

export async function getMailbox(query: MailboxQuery, signal?: AbortSignal): Promise<Mailbox> {
  try {
    const { messages } = await api.get<{ messages: CaughtMail[] }>('/dev/mailbox', {
      params: { to: query.to || undefined, limit: query.limit },
      signal,
    });
    return { available: true, messages };
  } catch (error) {
    if (isApiError(error) && error.status === 404) return { available: false };
    throw error;
  }
}

export const mailboxQueryKey = ['dev-mailbox'] as const;

/** Where one caught message's HTML part is served as a page of its own. */
export function mailHtmlHref(id: number): string {
  return `/api/dev/mailbox/${id}/html`;
}

/** Mail comes in without the page doing anything, so the list asks again every few seconds. */
export const mailboxRefreshMs = 4_000;

export function mailboxQueryOptions(to: string) {
  return queryOptions({
    queryKey: [...mailboxQueryKey, 'messages', to] as const,
    queryFn: ({ signal }) => getMailbox({ to }, signal),
    staleTime: 0,
    // A server without a mailbox does not grow one while the page is open.
    refetchInterval: (query) => (query.state.data?.available === false ? false : mailboxRefreshMs),
  });
}

export function useMailbox(to: string, options: { enabled: boolean }) {
  return useQuery({
    ...mailboxQueryOptions(to),
    enabled: options.enabled,
    // Another recipient's list keeps the old one on screen until it arrives.
    placeholderData: (previous) => previous,
  });
}

/** Whether this server keeps a mailbox at all: asked once per page load, for the menus. */
export function mailboxAvailableQueryOptions() {
  return queryOptions({
    queryKey: [...mailboxQueryKey, 'available'] as const,
    queryFn: ({ signal }) => getMailbox({ limit: 1 }, signal).then((box) => box.available),
    staleTime: Infinity,
    gcTime: Infinity,
  });
}

export function useMailboxAvailable(): boolean {
  return useQuery(mailboxAvailableQueryOptions()).data === true;
}
