import type { SignInInput } from '@mixmark/common';
import { useMutation } from '@tanstack/react-query';
import { api, type SessionReply } from '@/lib/api-client';
import { authStore } from '@/lib/auth-store';

export async function signIn(input: SignInInput): Promise<SessionReply> {
  const { data } = await api.post<SessionReply>('/auth/sign-in', input);
  return data;
}

export function useSignIn({ onSuccess }: { onSuccess?: (session: SessionReply) => void } = {}) {
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => {
      authStore.signIn(session.accessToken, session.user);
      onSuccess?.(session);
    },
  });
}
