import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Progress } from '../types';

/** The signed-in student's progress by week. */
export async function getMyProgress(): Promise<Progress> {
  const { data } = await api.get<Progress>('/progress/me');
  return data;
}

// Other people's uploads change this at any time: always refetch when a page shows it.
export const getMyProgressQueryOptions = () =>
  queryOptions({ queryKey: ['progress', 'me'], queryFn: getMyProgress, staleTime: 0 });

export function useMyProgress({ queryConfig }: { queryConfig?: Partial<ReturnType<typeof getMyProgressQueryOptions>> } = {}) {
  return useQuery({ ...getMyProgressQueryOptions(), ...queryConfig });
}
