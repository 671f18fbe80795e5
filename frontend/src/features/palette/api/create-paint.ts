import type { PaintInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Paint } from '../types';
import { getPaletteQueryOptions } from './get-palette';

export async function createPaint(input: PaintInput): Promise<Paint> {
  const { data } = await api.post<Paint>('/palette/paints', input);
  return data;
}

export function useCreatePaint({ onSuccess }: { onSuccess?: (created: Paint) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPaint,
    onSuccess: async (created) => {
      await queryClient.invalidateQueries({ queryKey: getPaletteQueryOptions().queryKey });
      onSuccess?.(created);
    },
  });
}
