import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ClassSummary } from '../types';

export async function acceptInvitation(token: string): Promise<ClassSummary> {
  const { data } = await api.post<ClassSummary>(`/invitations/${encodeURIComponent(token)}/accept`);
  return data;
}

export function useAcceptInvitation({ onSuccess }: { onSuccess?: (joined: ClassSummary) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: async (joined) => {
      await queryClient.invalidateQueries({ queryKey: ['classes'] });
      await queryClient.invalidateQueries({ queryKey: ['assignments'] });
      onSuccess?.(joined);
    },
  });
}
