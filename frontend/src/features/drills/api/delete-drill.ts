import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getDrillQueryOptions } from './get-drill';

/** Deletes a drill (`DELETE /drills/:id`, 204); past attempts and assignments keep it. */
export async function deleteDrill(id: string): Promise<void> {
  await api.delete(`/drills/${id}`);
}

export function useDeleteDrill({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDrill,
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: getDrillQueryOptions(id).queryKey });
      await queryClient.invalidateQueries({ queryKey: ['drills', 'list'] });
      onSuccess?.();
    },
  });
}
