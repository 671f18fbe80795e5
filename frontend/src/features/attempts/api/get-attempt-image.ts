import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export type AttemptImage = 'photo' | 'overlay';

/** The stored photo or the measured overlay; they need the Bearer header, so no plain <img src>. */
export async function getAttemptImage(id: string, which: AttemptImage): Promise<Blob> {
  const { data } = await api.get<Blob>(`/attempts/${id}/${which}`, { responseType: 'blob' });
  return data;
}

export const getAttemptImageQueryOptions = (id: string, which: AttemptImage) =>
  queryOptions({
    queryKey: ['attempts', 'detail', id, which],
    queryFn: () => getAttemptImage(id, which),
    staleTime: 5 * 60_000,
  });

export function useAttemptImage({ id, which, enabled = true }: { id: string; which: AttemptImage; enabled?: boolean }) {
  return useQuery({ ...getAttemptImageQueryOptions(id, which), enabled });
}
