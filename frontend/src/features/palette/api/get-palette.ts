import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Palette } from '../types';

export async function getPalette(): Promise<Palette> {
  const { data } = await api.get<Palette>('/palette');
  return data;
}

export const getPaletteQueryOptions = () => queryOptions({ queryKey: ['palette'], queryFn: getPalette });

export function usePalette({ queryConfig }: { queryConfig?: Partial<ReturnType<typeof getPaletteQueryOptions>> } = {}) {
  return useQuery({ ...getPaletteQueryOptions(), ...queryConfig });
}
