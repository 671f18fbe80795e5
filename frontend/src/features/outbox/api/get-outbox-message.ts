import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OutboxMessage } from '../types';

export async function getOutboxMessage(id: string): Promise<OutboxMessage> {
  const { data } = await api.get<OutboxMessage>(`/dev/outbox/${encodeURIComponent(id)}`);
  return data;
}

export const getOutboxMessageQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['dev-outbox', 'message', id], queryFn: () => getOutboxMessage(id) });

export function useOutboxMessage({ id }: { id: string }) {
  return useQuery(getOutboxMessageQueryOptions(id));
}
