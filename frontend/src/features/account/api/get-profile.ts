import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Profile } from '../types';

export async function getProfile(): Promise<Profile> {
  const { data } = await api.get<Profile>('/auth/me');
  return data;
}

export const getProfileQueryOptions = () =>
  queryOptions({ queryKey: ['account', 'me'], queryFn: getProfile });

export function useProfile({
  queryConfig,
}: { queryConfig?: Partial<ReturnType<typeof getProfileQueryOptions>> } = {}) {
  return useQuery({ ...getProfileQueryOptions(), ...queryConfig });
}
