import type { CreateDrillInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Drill } from '../types';

export async function createDrill(input: CreateDrillInput): Promise<Drill> {
  const { data } = await api.post<Drill>('/drills', input);
  return data;
}

export function useCreateDrill({ onSuccess }: { onSuccess?: (created: Drill) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDrill,
    onSuccess: async (created) => {
      await queryClient.invalidateQueries({ queryKey: ['drills', 'list'] });
      onSuccess?.(created);
    },
  });
}
