import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getInvitationsQueryOptions } from './get-invitations';
import { isInvitationGone } from './resend-invitation';

/** Withdraws a pending invitation (the API's revoke): its link is refused from then on. */
export async function withdrawInvitation(classId: string, invitationId: string): Promise<void> {
  await api.delete(`/classes/${classId}/invitations/${invitationId}`);
}

export function useWithdrawInvitation({
  classId,
  onSuccess,
  onError,
}: {
  classId: string;
  onSuccess?: () => void;
  /** Called before the list refreshes, so it still runs when the row it came from then goes. */
  onError?: (error: unknown) => void;
}) {
  const queryClient = useQueryClient();
  const refresh = () =>
    queryClient.invalidateQueries({ queryKey: getInvitationsQueryOptions(classId).queryKey });
  return useMutation({
    mutationFn: (invitationId: string) => withdrawInvitation(classId, invitationId),
    onSuccess: async () => {
      onSuccess?.();
      await refresh();
    },
    onError: async (error) => {
      onError?.(error);
      if (isInvitationGone(error)) await refresh();
    },
  });
}
