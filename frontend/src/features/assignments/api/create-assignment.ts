import type { CreateAssignmentInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AssignmentView } from '../types';

export async function createAssignment(input: CreateAssignmentInput): Promise<AssignmentView> {
  const { data } = await api.post<AssignmentView>('/assignments', input);
  return data;
}

export function useCreateAssignment({ onSuccess }: { onSuccess?: (created: AssignmentView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAssignment,
    onSuccess: async (created) => {
      await queryClient.invalidateQueries({ queryKey: ['assignments', 'list'] });
      onSuccess?.(created);
    },
  });
}
