import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AssignmentView } from '../types';

export async function getAssignment(id: string): Promise<AssignmentView> {
  const { data } = await api.get<AssignmentView>(`/assignments/${id}`);
  return data;
}

export const getAssignmentQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['assignments', 'detail', id], queryFn: () => getAssignment(id) });

export function useAssignment({ id }: { id: string }) {
  return useQuery(getAssignmentQueryOptions(id));
}
