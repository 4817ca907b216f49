/** Paths as data, with getHref, so links never hard-code strings. */
export const paths = {
  signIn: { path: '/signin', getHref: () => '/signin' },
  newStudio: { path: '/new-studio', getHref: () => '/new-studio' },
  home: { path: '/', getHref: () => '/' },
  styles: { path: '/styles', getHref: () => '/styles' },
  newStyle: { path: '/styles/new', getHref: () => '/styles/new' },
  style: { path: '/styles/:id', getHref: (id: number) => `/styles/${id}` },
  batches: { path: '/batches', getHref: () => '/batches' },
  newBatch: { path: '/batches/new', getHref: () => '/batches/new' },
  batch: { path: '/batches/:id', getHref: (id: number) => `/batches/${id}` },
  people: { path: '/people', getHref: () => '/people' },
  settings: { path: '/settings', getHref: () => '/settings' },
  account: { path: '/account', getHref: () => '/account' },
  audit: { path: '/audit', getHref: () => '/audit' },
} as const;
