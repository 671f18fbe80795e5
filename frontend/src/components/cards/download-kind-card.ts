import type { DrillKind } from '@mixmark/common';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { fileNameFrom, saveBlob } from '@/lib/save-blob';
import type { CardPaper } from './card-paper';

export type KindCardRequest = {
  kind: DrillKind;
  /** A value ladder's step count (2 to 9); the other kinds have a fixed number of windows. */
  steps?: number;
  paper: CardPaper;
};

/**
 * A reference card by kind, for a drill not saved yet or a paint's own swatch
 * (`GET /api/cards/:kind/card.pdf`): the card carries no drill, only its kind and window count.
 */
export async function getKindCardPdf({
  kind,
  steps,
  paper,
}: KindCardRequest): Promise<{ blob: Blob; fileName: string }> {
  const params = kind === 'value-ladder' && steps !== undefined ? { steps, paper } : { paper };
  const reply = await api.get<Blob>(`/cards/${kind}/card.pdf`, { params, responseType: 'blob' });
  return {
    blob: reply.data,
    fileName: fileNameFrom(
      reply.headers['content-disposition'],
      `mixmark-card-${kind}-${paper.toLowerCase()}.pdf`,
    ),
  };
}

export function useDownloadKindCardPdf() {
  return useMutation({
    mutationFn: getKindCardPdf,
    onSuccess: ({ blob, fileName }) => saveBlob(blob, fileName),
  });
}
