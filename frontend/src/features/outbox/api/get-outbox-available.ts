import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/**
 * Whether the server keeps e-mails for the development outbox: the route answers outside
 * production and is absent (404) in production. Asked once per visit; any failure reads as no.
 */
export async function getOutboxAvailable(): Promise<boolean> {
  const response = await api.get('/dev/outbox', { validateStatus: () => true });
  return response.status === 200;
}

export const getOutboxAvailableQueryOptions = () =>
  queryOptions({
    queryKey: ['dev-outbox', 'available'],
    queryFn: () => getOutboxAvailable().catch(() => false),
    staleTime: Infinity,
    retry: false,
  });

export function useOutboxAvailable() {
  return useQuery(getOutboxAvailableQueryOptions());
}
