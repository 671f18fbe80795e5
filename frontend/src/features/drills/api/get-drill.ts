import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Drill } from '../types';

export async function getDrill(id: string): Promise<Drill> {
  const { data } = await api.get<Drill>(`/drills/${id}`);
  return data;
}

export const getDrillQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['drills', 'detail', id], queryFn: () => getDrill(id) });

export function useDrill({
  id,
  queryConfig,
}: {
  id: string;
  queryConfig?: Partial<ReturnType<typeof getDrillQueryOptions>>;
}) {
  return useQuery({ ...getDrillQueryOptions(id), ...queryConfig });
}
