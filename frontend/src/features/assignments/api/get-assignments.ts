import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AssignmentView } from '../types';

export async function getAssignments({ classId }: { classId?: string } = {}): Promise<AssignmentView[]> {
  const { data } = await api.get<AssignmentView[]>('/assignments', { params: classId ? { classId } : undefined });
  return data;
}

export const getAssignmentsQueryOptions = ({ classId }: { classId?: string } = {}) =>
  queryOptions({
    queryKey: ['assignments', 'list', { classId: classId ?? null }],
    queryFn: () => getAssignments({ classId }),
  });

export function useAssignments({ classId }: { classId?: string } = {}) {
  return useQuery(getAssignmentsQueryOptions({ classId }));
}
