import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CardPaper } from '@/components/cards/card-paper';
import { fileNameFrom, saveBlob } from '@/lib/save-blob';

export type { CardPaper };

/** The drill's reference card as a true-size PDF for the paper given. */
export async function getCardPdf(drillId: string, paper: CardPaper): Promise<{ blob: Blob; fileName: string }> {
  const reply = await api.get<Blob>(`/drills/${drillId}/card.pdf`, { params: { paper }, responseType: 'blob' });
  return { blob: reply.data, fileName: fileNameFrom(reply.headers['content-disposition'], `mixmark-card-${paper.toLowerCase()}.pdf`) };
}

export function useDownloadCardPdf({ drillId }: { drillId: string }) {
  return useMutation({
    mutationFn: (paper: CardPaper) => getCardPdf(drillId, paper),
    onSuccess: ({ blob, fileName }) => saveBlob(blob, fileName),
  });
}
