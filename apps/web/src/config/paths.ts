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
  newBoardImport: { path: '/import', getHref: () => '/import' },
} as const;
