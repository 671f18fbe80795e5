import type { DrillKind, Lab } from '@mixmark/common';
import { api } from '@/lib/api-client';
import { reportUpload, useUploadMutation } from '@/lib/use-upload-mutation';

/** What `POST /api/drills/targets/measure` answers: one reading per window of the card, in window order. */
export type MeasuredTargets = {
  targets: { lab: Lab; hex: string; spread: { L: number; a: number; b: number } }[];
  /** The kind of drill the card in the photo was printed for (its corner codes say so). */
  cardKind: DrillKind;
  /** Things that did not stop the reading but make it less sure, in words. */
  warnings: { code: string; message: string }[];
};

/**
 * Sends a photo of the teacher's own painted swatch through a Mixmark card; the server measures
 * it with the students' pipeline and stores nothing. Fails with the photo's first quality error
 * (422, e.g. `CARD_NOT_FOUND`, `GLARE`, `BLURRED`) in the API's error shape.
 */
export async function measureTargets(
  photo: File,
  onProgress?: (fraction: number) => void,
): Promise<MeasuredTargets> {
  const body = new FormData();
  body.append('photo', photo);
  const { data } = await api.post<MeasuredTargets>('/drills/targets/measure', body, {
    timeout: 120_000,
    onUploadProgress: reportUpload(onProgress),
  });
  return data;
}

export function useMeasureTargets({
  onSuccess,
}: { onSuccess?: (measured: MeasuredTargets) => void } = {}) {
  return useUploadMutation(measureTargets, { onSuccess });
}
