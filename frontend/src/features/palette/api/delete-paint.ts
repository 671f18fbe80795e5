import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getPaletteQueryOptions } from './get-palette';

export async function deletePaint(id: string): Promise<void> {
  await api.delete(`/palette/paints/${id}`);
}

export function useDeletePaint({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePaint,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: getPaletteQueryOptions().queryKey });
      onSuccess?.();
    },
  });
}
