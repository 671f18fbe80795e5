import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Progress } from '../types';

/** One student's progress, for a teacher of one of their classes. */
export async function getStudentProgress(id: string): Promise<Progress> {
  const { data } = await api.get<Progress>(`/progress/students/${id}`);
  return data;
}

export const getStudentProgressQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['progress', 'students', id], queryFn: () => getStudentProgress(id) });

export function useStudentProgress({
  id,
  queryConfig,
}: {
  id: string;
  queryConfig?: Partial<ReturnType<typeof getStudentProgressQueryOptions>>;
}) {
  return useQuery({ ...getStudentProgressQueryOptions(id), ...queryConfig });
}
