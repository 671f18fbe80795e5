import type { UpdateAssignmentInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AssignmentView } from '../types';
import { getAssignmentQueryOptions } from './get-assignment';

/** Changes an assignment's due date or note (`PATCH /assignments/:id`). */
export async function updateAssignment(id: string, input: UpdateAssignmentInput): Promise<AssignmentView> {
  const { data } = await api.patch<AssignmentView>(`/assignments/${id}`, input);
  return data;
}

export function useUpdateAssignment({ id, onSuccess }: { id: string; onSuccess?: (updated: AssignmentView) => void }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateAssignmentInput) => updateAssignment(id, input),
    onSuccess: async (updated) => {
      await queryClient.invalidateQueries({ queryKey: getAssignmentQueryOptions(id).queryKey });
      await queryClient.invalidateQueries({ queryKey: ['assignments', 'list'] });
      onSuccess?.(updated);
    },
  });
}
