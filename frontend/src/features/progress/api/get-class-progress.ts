import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Progress } from '../types';

/** A class's progress: every student's attempts together, by week. */
export async function getClassProgress(id: string): Promise<Progress> {
  const { data } = await api.get<Progress>(`/progress/classes/${id}`);
  return data;
}

// Other people's uploads change this at any time: always refetch when a page shows it.
export const getClassProgressQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['progress', 'classes', id], queryFn: () => getClassProgress(id), staleTime: 0 });

export function useClassProgress({
  id,
  queryConfig,
}: {
  id: string;
  queryConfig?: Partial<ReturnType<typeof getClassProgressQueryOptions>>;
}) {
  return useQuery({ ...getClassProgressQueryOptions(id), ...queryConfig });
}
