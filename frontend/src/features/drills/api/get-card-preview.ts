import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** A picture of the drill's reference card; it needs the Bearer header, so it comes as a blob. */
export async function getCardPreview(drillId: string): Promise<Blob> {
  const { data } = await api.get<Blob>(`/drills/${drillId}/card.png`, { responseType: 'blob' });
  return data;
}

export const getCardPreviewQueryOptions = (drillId: string) =>
  queryOptions({
    queryKey: ['drills', 'detail', drillId, 'card.png'],
    queryFn: () => getCardPreview(drillId),
    staleTime: 60 * 60_000,
  });

export function useCardPreview({ drillId }: { drillId: string }) {
  return useQuery(getCardPreviewQueryOptions(drillId));
}
