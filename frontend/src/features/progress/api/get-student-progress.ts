import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Progress } from '../types';

/** One student's progress, for a teacher of one of their classes. */
export async function getStudentProgress(id: string): Promise<Progress> {
  const { data } = await api.get<Progress>(`/progress/students/${id}`);
  return data;
}

// Other people's uploads change this at any time: always refetch when a page shows it.
export const getStudentProgressQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['progress', 'students', id], queryFn: () => getStudentProgress(id), staleTime: 0 });

export function useStudentProgress({
  id,
  queryConfig,
}: {
  id: string;
  queryConfig?: Partial<ReturnType<typeof getStudentProgressQueryOptions>>;
}) {
  return useQuery({ ...getStudentProgressQueryOptions(id), ...queryConfig });
}
