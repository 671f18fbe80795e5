import type { OverrideMarkInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Attempt } from '../types';
import { getAttemptQueryOptions } from './get-attempt';

export async function overrideAttempt(id: string, input: OverrideMarkInput): Promise<Attempt> {
  const { data } = await api.patch<Attempt>(`/attempts/${id}/override`, input);
  return data;
}

export function useOverrideAttempt({ id, onSuccess }: { id: string; onSuccess?: (updated: Attempt) => void }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OverrideMarkInput) => overrideAttempt(id, input),
    onSuccess: async (updated) => {
      queryClient.setQueryData(getAttemptQueryOptions(id).queryKey, updated);
      await queryClient.invalidateQueries({ queryKey: ['attempts', 'list'] });
      await queryClient.invalidateQueries({ queryKey: ['assignments'] });
      onSuccess?.(updated);
    },
  });
}
