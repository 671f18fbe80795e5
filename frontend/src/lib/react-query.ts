import { QueryClient, type DefaultOptions } from '@tanstack/react-query';

/**
 * Rosters, marks and progress change under other people's hands (a student joins, a photo is
 * graded): a page shows what is cached at once and refetches it on every visit (staleTime 0).
 */
export const queryConfig = {
  queries: { staleTime: 0, refetchOnWindowFocus: false, retry: 1 },
} satisfies DefaultOptions;

export function createQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: queryConfig });
}
