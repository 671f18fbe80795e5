import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Empties the development outbox. */
export async function clearOutbox(): Promise<void> {
  await api.delete('/dev/outbox');
}

export function useClearOutbox({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: clearOutbox,
    onSuccess: async () => {
      queryClient.removeQueries({ queryKey: ['dev-outbox', 'message'] });
      await queryClient.invalidateQueries({ queryKey: ['dev-outbox', 'list'] });
      onSuccess?.();
    },
  });
}
