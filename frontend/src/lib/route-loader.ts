import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { authStore, type UserRole } from './auth-store';

/** What a route module exports as `loader`: given the app's QueryClient, the router's loader. */
export type RouteLoader = (queryClient: QueryClient) => (args: LoaderFunctionArgs) => Promise<null>;

/** How long a navigation waits for its data before the page shows with its own spinner. */
const patienceMs = 2000;

/**
 * A loader that fills the cache before the page shows, so a page reached by a link draws with
 * its data instead of a spinner (STYLE.md, loaders): `ensureQueryData` through the same
 * `queryOptions` factories the components read with `useQuery`.
 *
 * It never stands in the page's way: on the first page load (the session is still being
 * restored), for someone the route guard will send elsewhere, when a request fails (the page
 * asks again and words the error) or when the server is slow (after 2 s the page shows with
 * its own loading state), it returns at once.
 */
export function prefetchLoader(
  roles: readonly UserRole[],
  prefetch: (queryClient: QueryClient, args: LoaderFunctionArgs) => Promise<unknown>[],
): RouteLoader {
  return (queryClient) => async (args) => {
    const auth = authStore.get();
    if (auth.status !== 'signed-in' || !roles.includes(auth.user.role)) return null;
    const settled = Promise.allSettled(prefetch(queryClient, args));
    await Promise.race([settled, new Promise((resolve) => setTimeout(resolve, patienceMs))]);
    return null;
  };
}
