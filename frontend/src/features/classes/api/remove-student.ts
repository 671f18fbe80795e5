import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getRosterQueryOptions } from './get-roster';

export async function removeStudent(classId: string, studentId: string): Promise<void> {
  await api.delete(`/classes/${classId}/students/${studentId}`);
}

export function useRemoveStudent({ classId }: { classId: string }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (studentId: string) => removeStudent(classId, studentId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: getRosterQueryOptions(classId).queryKey }),
        queryClient.invalidateQueries({ queryKey: ['classes', 'list'] }),
      ]),
  });
}
