import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Drill, DrillScope } from '../types';

export async function getDrills({ scope }: { scope: DrillScope }): Promise<Drill[]> {
  const { data } = await api.get<Drill[]>('/drills', { params: { scope } });
  return data;
}

export const getDrillsQueryOptions = ({ scope }: { scope: DrillScope }) =>
  queryOptions({ queryKey: ['drills', 'list', { scope }], queryFn: () => getDrills({ scope }) });

export function useDrills({ scope }: { scope: DrillScope }) {
  return useQuery(getDrillsQueryOptions({ scope }));
}
