import type { InviteStudentsInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvitationSummary } from '../types';
import { getInvitationsQueryOptions } from './get-invitations';

export async function inviteStudents(classId: string, input: InviteStudentsInput): Promise<InvitationSummary[]> {
  const { data } = await api.post<InvitationSummary[]>(`/classes/${classId}/invitations`, input);
  return data;
}

export function useInviteStudents({
  classId,
  onSuccess,
}: {
  classId: string;
  onSuccess?: (sent: InvitationSummary[]) => void;
}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteStudentsInput) => inviteStudents(classId, input),
    onSuccess: async (sent) => {
      await queryClient.invalidateQueries({ queryKey: getInvitationsQueryOptions(classId).queryKey });
      onSuccess?.(sent);
    },
  });
}
