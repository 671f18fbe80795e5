import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SessionUser } from '@/lib/auth-store';

export async function getUsers(): Promise<SessionUser[]> {
  const { data } = await api.get<SessionUser[]>('/admin/users');
  return data;
}

export const getUsersQueryOptions = () => queryOptions({ queryKey: ['users', 'list'], queryFn: getUsers });

export function useUsers() {
  return useQuery(getUsersQueryOptions());
}
