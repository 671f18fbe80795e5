import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OutboxEntry } from '../types';

/** The development outbox: every kept e-mail, newest first. A 404 means the server runs in production. */
export async function getOutbox(): Promise<OutboxEntry[]> {
  const { data } = await api.get<OutboxEntry[]>('/dev/outbox');
  return data;
}

export const getOutboxQueryOptions = () =>
  queryOptions({ queryKey: ['dev-outbox', 'list'], queryFn: getOutbox });

export function useOutbox() {
  return useQuery(getOutboxQueryOptions());
}
