import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RosterEntry } from '../types';

export async function getRoster(classId: string): Promise<RosterEntry[]> {
  const { data } = await api.get<RosterEntry[]>(`/classes/${classId}/students`);
  return data;
}

export const getRosterQueryOptions = (classId: string) =>
  queryOptions({ queryKey: ['classes', 'detail', classId, 'students'], queryFn: () => getRoster(classId) });

export function useRoster({ classId }: { classId: string }) {
  return useQuery(getRosterQueryOptions(classId));
}
