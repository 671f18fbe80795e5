import type { JoinClassInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ClassSummary } from '../types';

export async function joinClass(input: JoinClassInput): Promise<ClassSummary> {
  const { data } = await api.post<ClassSummary>('/classes/join', input);
  return data;
}

export function useJoinClass({ onSuccess }: { onSuccess?: (joined: ClassSummary) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: joinClass,
    onSuccess: async (joined) => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['classes'] }),
        queryClient.invalidateQueries({ queryKey: ['assignments'] }),
      ]);
      onSuccess?.(joined);
    },
  });
}
