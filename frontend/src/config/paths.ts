/** Every route, defined once. */
export const paths = {
  home: { path: '/', getHref: () => '/' },
  status: { path: '/status', getHref: () => '/status' },
} as const;
