import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ClassSummary } from '../types';

export async function getClass(id: string): Promise<ClassSummary> {
  const { data } = await api.get<ClassSummary>(`/classes/${id}`);
  return data;
}

export const getClassQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['classes', 'detail', id], queryFn: () => getClass(id) });

export function useClass({
  id,
  queryConfig,
}: {
  id: string;
  queryConfig?: Partial<ReturnType<typeof getClassQueryOptions>>;
}) {
  return useQuery({ ...getClassQueryOptions(id), ...queryConfig });
}
