import type { UpdateRoleInput } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SessionUser } from '@/lib/auth-store';
import { getUsersQueryOptions } from './get-users';

export async function updateUserRole(id: string, input: UpdateRoleInput): Promise<SessionUser> {
  const { data } = await api.patch<SessionUser>(`/admin/users/${id}/role`, input);
  return data;
}

export function useUpdateUserRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: string } & UpdateRoleInput) => updateUserRole(id, { role }),
    onSuccess: (saved) => {
      // The table shows the saved role at once, then the list is read again.
      queryClient.setQueryData(getUsersQueryOptions().queryKey, (list) =>
        list?.map((user) => (user.id === saved.id ? saved : user)),
      );
      return queryClient.invalidateQueries({ queryKey: getUsersQueryOptions().queryKey });
    },
  });
}
