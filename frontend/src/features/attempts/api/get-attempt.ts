import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isPending, type Attempt } from '../types';

export async function getAttempt(id: string): Promise<Attempt> {
  const { data } = await api.get<Attempt>(`/attempts/${id}`);
  return data;
}

/** Asks again every 1.5 s while the photo waits in the queue or is being measured. */
export const getAttemptQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['attempts', 'detail', id],
    queryFn: () => getAttempt(id),
    refetchInterval: (query) => (query.state.data && isPending(query.state.data.state) ? 1500 : false),
  });

export function useAttempt({ id }: { id: string }) {
  return useQuery(getAttemptQueryOptions(id));
}
