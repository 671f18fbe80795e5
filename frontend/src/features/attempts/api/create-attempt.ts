import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { api } from '@/lib/api-client';
import { reportUpload } from '@/lib/use-upload-mutation';
import type { Attempt } from '../types';

export type CreateAttemptRequest = { photo: File; assignmentId?: string; drillId?: string };

/** Multipart upload; `onProgress` gets the fraction sent (0..1). 202: queued for grading. */
export async function createAttempt(
  { photo, assignmentId, drillId }: CreateAttemptRequest,
  onProgress?: (fraction: number) => void,
): Promise<Attempt> {
  const body = new FormData();
  if (assignmentId) body.append('assignmentId', assignmentId);
  else if (drillId) body.append('drillId', drillId);
  body.append('photo', photo);
  const { data } = await api.post<Attempt>('/attempts', body, {
    timeout: 120_000,
    onUploadProgress: reportUpload(onProgress),
  });
  return data;
}

export function useCreateAttempt({ onSuccess }: { onSuccess?: (created: Attempt) => void } = {}) {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState(0);
  const mutation = useMutation({
    mutationFn: (request: CreateAttemptRequest) => {
      setProgress(0);
      return createAttempt(request, setProgress);
    },
    onSuccess: async (created) => {
      setProgress(1);
      queryClient.setQueryData(['attempts', 'detail', created.id], created);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['attempts', 'list'] }),
        queryClient.invalidateQueries({ queryKey: ['assignments'] }),
      ]);
      onSuccess?.(created);
    },
  });
  return { ...mutation, progress };
}
