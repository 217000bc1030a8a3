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
  newBoardImport: { path: '/import', getHref: () => '/import' },
  search: {
    path: '/search',
    getHref: (query?: string) =>
      query ? `/search?${new URLSearchParams({ q: query }).toString()}` : '/search',
  },
} as const;
