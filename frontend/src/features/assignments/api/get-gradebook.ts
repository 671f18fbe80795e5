import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Gradebook } from '../types';

/** A class's gradebook: every student against every assignment. */
export async function getGradebook(classId: string): Promise<Gradebook> {
  const { data } = await api.get<Gradebook>(`/classes/${classId}/gradebook`);
  return data;
}

// Other people's uploads change this at any time: always refetch when a page shows it.
export const getGradebookQueryOptions = (classId: string) =>
  queryOptions({ queryKey: ['assignments', 'gradebook', classId], queryFn: () => getGradebook(classId), staleTime: 0 });

export function useGradebook({
  classId,
  queryConfig,
}: {
  classId: string;
  queryConfig?: Partial<ReturnType<typeof getGradebookQueryOptions>>;
}) {
  return useQuery({ ...getGradebookQueryOptions(classId), ...queryConfig });
}
