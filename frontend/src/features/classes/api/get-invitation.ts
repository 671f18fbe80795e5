import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvitationPreview } from '../types';

/** Public: anyone with the link may see which class it is for, before signing in. */
export async function getInvitation(token: string): Promise<InvitationPreview> {
  const { data } = await api.get<InvitationPreview>(`/invitations/${encodeURIComponent(token)}`);
  return data;
}

export const getInvitationQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitations', 'detail', token], queryFn: () => getInvitation(token), retry: false });

export function useInvitation({ token }: { token: string }) {
  return useQuery(getInvitationQueryOptions(token));
}
