import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getAssignmentQueryOptions } from './get-assignment';

/** Withdraws an assignment from its class (`DELETE /assignments/:id`, 204). */
export async function deleteAssignment(id: string): Promise<void> {
  await api.delete(`/assignments/${id}`);
}

export function useDeleteAssignment({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteAssignment,
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: getAssignmentQueryOptions(id).queryKey });
      await queryClient.invalidateQueries({ queryKey: ['assignments', 'list'] });
      onSuccess?.();
    },
  });
}
