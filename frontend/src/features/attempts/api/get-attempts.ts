import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Attempt } from '../types';

export type AttemptFilter = { assignmentId?: string; drillId?: string; studentId?: string };

/** A student gets their own attempts; a teacher those of their classes' students. */
export async function getAttempts(filter: AttemptFilter = {}): Promise<Attempt[]> {
  const { data } = await api.get<Attempt[]>('/attempts', { params: filter });
  return data;
}

export const getAttemptsQueryOptions = (filter: AttemptFilter = {}) =>
  queryOptions({ queryKey: ['attempts', 'list', filter], queryFn: () => getAttempts(filter) });

export function useAttempts(filter: AttemptFilter = {}) {
  return useQuery(getAttemptsQueryOptions(filter));
}
