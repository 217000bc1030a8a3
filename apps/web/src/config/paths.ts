// Every client URL, defined once. Routes use `path`; links use `getHref`.
export const paths = {
  home: { path: '/', getHref: () => '/' },
  boards: { path: '/boards', getHref: () => '/boards' },
  board: {
    path: '/boards/:slug',
    getHref: (slug: string) => `/boards/${encodeURIComponent(slug)}`,
  },
  boardImport: {
    path: '/boards/:slug/import',
    getHref: (slug: string) => `/boards/${encodeURIComponent(slug)}/import`,
  },
  /** A net's own page; `net` is the printed name or an alias (the page redirects to the name). */
  net: {
    path: '/boards/:slug/nets/:net',
    getHref: (slug: string, net: string) =>
      `/boards/${encodeURIComponent(slug)}/nets/${encodeURIComponent(net)}`,
  },
  /** A part's own page; `refdes` in any letter case (the page redirects to the board's spelling). */
  component: {
    path: '/boards/:slug/components/:refdes',
    getHref: (slug: string, refdes: string) =>
      `/boards/${encodeURIComponent(slug)}/components/${encodeURIComponent(refdes)}`,
  },
  newBoardImport: { path: '/import', getHref: () => '/import' },
  /** A board's casebook; `filters` become the query string the list page reads back. */
  boardCases: {
    path: '/boards/:slug/cases',
    getHref: (slug: string, filters?: Record<string, string>) => {
      const query = new URLSearchParams(filters).toString();
      return `/boards/${encodeURIComponent(slug)}/cases${query ? `?${query}` : ''}`;
    },
  },
  /** A new case on a board, optionally starting with nets and parts already picked. */
  newCase: {
    path: '/boards/:slug/cases/new',
    getHref: (slug: string, preset?: { net?: string; component?: string }) => {
      const query = new URLSearchParams(
        Object.entries(preset ?? {}).filter((entry): entry is [string, string] => !!entry[1]),
      ).toString();
      return `/boards/${encodeURIComponent(slug)}/cases/new${query ? `?${query}` : ''}`;
    },
  },
  case: { path: '/cases/:id', getHref: (id: number) => `/cases/${id}` },
  editCase: { path: '/cases/:id/edit', getHref: (id: number) => `/cases/${id}/edit` },
  caseHistory: { path: '/cases/:id/history', getHref: (id: number) => `/cases/${id}/history` },
  admin: { path: '/admin', getHref: () => '/admin' },
  /** open flags for moderators to look at */
  moderation: { path: '/moderation', getHref: () => '/moderation' },
  /** the mail the development server caught (only where the local mail catcher runs) */
  mailbox: { path: '/mailbox', getHref: () => '/mailbox' },
  /** e-mail links point here; keep it in step with the API's notification templates */
  notificationSettings: { path: '/settings/notifications', getHref: () => '/settings/notifications' },
  /**
   * The server's sign-in, not a client route: a full-page navigation (a plain link) that comes
   * back to `returnTo`, a path on this site.
   */
  signIn: {
    path: '/auth/github',
    getHref: (returnTo: string) => `/auth/github?${new URLSearchParams({ returnTo }).toString()}`,
  },
  search: {
    path: '/search',
    getHref: (query?: string) =>
      query ? `/search?${new URLSearchParams({ q: query }).toString()}` : '/search',
  },
} as const;
