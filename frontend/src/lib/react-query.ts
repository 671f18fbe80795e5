import { QueryClient, type DefaultOptions } from '@tanstack/react-query';

export const queryConfig = {
  queries: { staleTime: 30_000, refetchOnWindowFocus: false, retry: 1 },
} satisfies DefaultOptions;

export function createQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: queryConfig });
}
