import type { DrillKind, Lab } from '@mixmark/common';
import { api } from '@/lib/api-client';
import { reportUpload, useUploadMutation } from '@/lib/use-upload-mutation';

/** What `POST /api/palette/swatch/measure` answers: one reading per window of the card, in window order. */
export type MeasuredPaintSwatch = {
  /** The kind of card found in the photo (its windows decide how many readings there are). */
  cardKind: DrillKind;
  swatches: { lab: Lab; hex: string; spread: { L: number; a: number; b: number } }[];
  /** Things that did not stop the reading but make it less sure, each a code and a sentence. */
  warnings: { code: string; message: string }[];
};

/**
 * Sends a photo of a painted-out swatch under any Mixmark card; the server reads it with the
 * grading pipeline and stores nothing. Fails with 400 `photo_missing`, 413, 415 for a file that
 * is not a photo, or 422 with the first quality code (`CARD_NOT_FOUND`, `GLARE`…) and every
 * problem's sentence in the message.
 */
export async function measurePaintSwatch(
  photo: File,
  onProgress?: (fraction: number) => void,
): Promise<MeasuredPaintSwatch> {
  const body = new FormData();
  body.append('photo', photo);
  const { data } = await api.post<MeasuredPaintSwatch>('/palette/swatch/measure', body, {
    timeout: 120_000,
    onUploadProgress: reportUpload(onProgress),
  });
  return data;
}

export function useMeasurePaintSwatch({
  onSuccess,
}: { onSuccess?: (measured: MeasuredPaintSwatch) => void } = {}) {
  return useUploadMutation(measurePaintSwatch, { onSuccess });
}
