import type { UpdateClassInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ClassSummary } from '../types';
import { getClassQueryOptions } from './get-class';

export async function updateClass(id: string, input: UpdateClassInput): Promise<ClassSummary> {
  const { data } = await api.patch<ClassSummary>(`/classes/${id}`, input);
  return data;
}

/**
 * Optimistic: a rename shows at once (snapshot → set → roll back on error → refetch on settle).
 */
export function useUpdateClass({ id }: { id: string }) {
  const queryClient = useQueryClient();
  const { queryKey } = getClassQueryOptions(id);
  return useMutation({
    mutationFn: (input: UpdateClassInput) => updateClass(id, input),
    onMutate: async (input) => {
      await queryClient.cancelQueries({ queryKey });
      const previous = queryClient.getQueryData(queryKey);
      if (previous) queryClient.setQueryData(queryKey, { ...previous, ...input });
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) queryClient.setQueryData(queryKey, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['classes'] }),
  });
}
