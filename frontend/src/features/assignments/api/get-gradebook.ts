import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Gradebook } from '../types';

/** A class's gradebook: every student against every assignment. */
export async function getGradebook(classId: string): Promise<Gradebook> {
  const { data } = await api.get<Gradebook>(`/classes/${classId}/gradebook`);
  return data;
}

export const getGradebookQueryOptions = (classId: string) =>
  queryOptions({ queryKey: ['assignments', 'gradebook', classId], queryFn: () => getGradebook(classId) });

export function useGradebook({
  classId,
  queryConfig,
}: {
  classId: string;
  queryConfig?: Partial<ReturnType<typeof getGradebookQueryOptions>>;
}) {
  return useQuery({ ...getGradebookQueryOptions(classId), ...queryConfig });
}
