import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvitationSummary } from '../types';

export async function getInvitations(classId: string): Promise<InvitationSummary[]> {
  const { data } = await api.get<InvitationSummary[]>(`/classes/${classId}/invitations`);
  return data;
}

export const getInvitationsQueryOptions = (classId: string) =>
  queryOptions({
    queryKey: ['classes', 'detail', classId, 'invitations'],
    queryFn: () => getInvitations(classId),
  });

export function useInvitations({ classId }: { classId: string }) {
  return useQuery(getInvitationsQueryOptions(classId));
}
