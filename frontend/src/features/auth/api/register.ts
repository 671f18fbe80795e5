import type { RegisterInput } from '@mixmark/common';
import { useMutation } from '@tanstack/react-query';
import { api, type SessionReply } from '@/lib/api-client';
import { authStore } from '@/lib/auth-store';

export async function register(input: RegisterInput): Promise<SessionReply> {
  const { data } = await api.post<SessionReply>('/auth/register', input);
  return data;
}

export function useRegister({ onSuccess }: { onSuccess?: (session: SessionReply) => void } = {}) {
  return useMutation({
    mutationFn: register,
    onSuccess: (session) => {
      authStore.signIn(session.accessToken, session.user);
      onSuccess?.(session);
    },
  });
}
