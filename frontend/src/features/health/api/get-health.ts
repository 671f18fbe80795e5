import { healthSchema, type Health } from '@mixmark/common';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** The API reports 503 with the same body when the database is down; both are answers. */
export async function getHealth(): Promise<Health> {
  const response = await api.get('/health', { validateStatus: (status) => status === 200 || status === 503 });
  return healthSchema.validate(response.data);
}

export const getHealthQueryOptions = () => queryOptions({ queryKey: ['health'], queryFn: getHealth });

export function useHealth({ queryConfig }: { queryConfig?: Partial<ReturnType<typeof getHealthQueryOptions>> } = {}) {
  return useQuery({ ...getHealthQueryOptions(), ...queryConfig });
}
