import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Drill } from '../types';

/** A private copy of a drill in the caller's own library (`POST /drills/:id/duplicate`). */
export async function duplicateDrill(id: string): Promise<Drill> {
  const { data } = await api.post<Drill>(`/drills/${id}/duplicate`);
  return data;
}

export function useDuplicateDrill({ onSuccess }: { onSuccess?: (copy: Drill) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicateDrill,
    onSuccess: async (copy) => {
      await queryClient.invalidateQueries({ queryKey: ['drills', 'list'] });
      onSuccess?.(copy);
    },
  });
}
