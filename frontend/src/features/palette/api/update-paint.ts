import type { PaintInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Paint } from '../types';
import { getPaletteQueryOptions } from './get-palette';

export async function updatePaint(id: string, input: PaintInput): Promise<Paint> {
  const { data } = await api.put<Paint>(`/palette/paints/${id}`, input);
  return data;
}

export function useUpdatePaint({ id, onSuccess }: { id: string; onSuccess?: (updated: Paint) => void }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PaintInput) => updatePaint(id, input),
    onSuccess: async (updated) => {
      await queryClient.invalidateQueries({ queryKey: getPaletteQueryOptions().queryKey });
      onSuccess?.(updated);
    },
  });
}
