import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, toApiError } from '@/lib/api-client';
import type { InvitationSummary } from '../types';
import { getInvitationsQueryOptions } from './get-invitations';

/** Mails a pending invitation again: a new link, a fresh expiry; the earlier link stops working. */
export async function resendInvitation(
  classId: string,
  invitationId: string,
): Promise<InvitationSummary> {
  const { data } = await api.post<InvitationSummary>(
    `/classes/${classId}/invitations/${invitationId}/resend`,
  );
  return data;
}

/** True when the API says the invitation is no longer pending (accepted or withdrawn meanwhile). */
export function isInvitationGone(error: unknown): boolean {
  return toApiError(error).code === 'invitation_not_found';
}

export function useResendInvitation({
  classId,
  onSuccess,
  onError,
}: {
  classId: string;
  onSuccess?: (sent: InvitationSummary) => void;
  /** Called before the list refreshes, so it still runs when the row it came from then goes. */
  onError?: (error: unknown) => void;
}) {
  const queryClient = useQueryClient();
  const refresh = () =>
    queryClient.invalidateQueries({ queryKey: getInvitationsQueryOptions(classId).queryKey });
  return useMutation({
    mutationFn: (invitationId: string) => resendInvitation(classId, invitationId),
    onSuccess: async (sent) => {
      onSuccess?.(sent);
      await refresh();
    },
    onError: async (error) => {
      onError?.(error);
      if (isInvitationGone(error)) await refresh();
    },
  });
}
