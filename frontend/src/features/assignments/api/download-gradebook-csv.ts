import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { fileNameFrom, saveBlob } from '@/lib/save-blob';

/** The gradebook as CSV; it needs the Bearer header, so it comes as a blob through the client. */
export async function getGradebookCsv(classId: string): Promise<{ blob: Blob; fileName: string }> {
  const reply = await api.get<Blob>(`/classes/${classId}/gradebook.csv`, { responseType: 'blob' });
  return { blob: reply.data, fileName: fileNameFrom(reply.headers['content-disposition'], 'gradebook.csv') };
}

export function useDownloadGradebookCsv({ classId }: { classId: string }) {
  return useMutation({
    mutationFn: () => getGradebookCsv(classId),
    onSuccess: ({ blob, fileName }) => saveBlob(blob, fileName),
  });
}
