import type { UpdateDrillInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Drill } from '../types';
import { getDrillQueryOptions } from './get-drill';

export async function updateDrill(id: string, input: UpdateDrillInput): Promise<Drill> {
  const { data } = await api.put<Drill>(`/drills/${id}`, input);
  return data;
}

export function useUpdateDrill({ id, onSuccess }: { id: string; onSuccess?: (updated: Drill) => void }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateDrillInput) => updateDrill(id, input),
    onSuccess: async (updated) => {
      queryClient.setQueryData(getDrillQueryOptions(id).queryKey, updated);
      await queryClient.invalidateQueries({ queryKey: ['drills', 'list'] });
      onSuccess?.(updated);
    },
  });
}
