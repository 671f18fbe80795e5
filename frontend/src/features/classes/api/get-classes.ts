import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ClassSummary } from '../types';

export async function getClasses({ archived = false } = {}): Promise<ClassSummary[]> {
  const { data } = await api.get<ClassSummary[]>('/classes', {
    params: archived ? { archived: 'true' } : undefined,
  });
  return data;
}

export const getClassesQueryOptions = ({ archived = false } = {}) =>
  queryOptions({ queryKey: ['classes', 'list', { archived }], queryFn: () => getClasses({ archived }) });

export function useClasses({
  archived = false,
  queryConfig,
}: { archived?: boolean; queryConfig?: Partial<ReturnType<typeof getClassesQueryOptions>> } = {}) {
  return useQuery({ ...getClassesQueryOptions({ archived }), ...queryConfig });
}
