import type { CreateClassInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ClassSummary } from '../types';

export async function createClass(input: CreateClassInput): Promise<ClassSummary> {
  const { data } = await api.post<ClassSummary>('/classes', input);
  return data;
}

export function useCreateClass({ onSuccess }: { onSuccess?: (created: ClassSummary) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClass,
    onSuccess: async (created) => {
      await queryClient.invalidateQueries({ queryKey: ['classes', 'list'] });
      onSuccess?.(created);
    },
  });
}
