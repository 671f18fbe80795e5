import { useMutation } from '@tanstack/react-query';
import type { AxiosProgressEvent } from 'axios';
import { useState } from 'react';

/** axios's `onUploadProgress` turned into the fraction sent (0..1), for a progress bar. */
export const reportUpload =
  (onProgress?: (fraction: number) => void) =>
  (event: AxiosProgressEvent): void => {
    if (event.total) onProgress?.(event.loaded / event.total);
  };

/**
 * A mutation that uploads a file and keeps how much of it has been sent (`progress`, 0..1;
 * 1 once the server has answered).
 */
export function useUploadMutation<TInput, TResult>(
  send: (input: TInput, onProgress: (fraction: number) => void) => Promise<TResult>,
  { onSuccess }: { onSuccess?: (result: TResult) => void } = {},
) {
  const [progress, setProgress] = useState(0);
  const mutation = useMutation({
    mutationFn: (input: TInput) => {
      setProgress(0);
      return send(input, setProgress);
    },
    onSuccess: (result) => {
      setProgress(1);
      onSuccess?.(result);
    },
  });
  return { ...mutation, progress };
}
